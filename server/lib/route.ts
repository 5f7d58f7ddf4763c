// One place per route: method, path, guards, request schemas and response schema beside its handler.
// The handler receives the parsed body/query/params with their schemas' types and RETURNS its answer, typed
// by the response schema (z.input), so a handler cannot answer something its schema does not describe.
// Outside production every answer is also parsed against the schema (and any field the schema does not name
// is refused), so every HTTP test is a contract test; production sends the value as it is (DEVELOPERS.md).
import { Router, type Request, type RequestHandler, type Response } from "express";
import { z } from "zod";
import { parseOrThrow } from "../middleware/validate";

export type Method = "get" | "post" | "put" | "patch" | "delete";

/** The response of a route that answers 204 with no body. */
export const noContent = z.void().describe("204 No Content");
/** The response of a route that answers a CSV file (text/csv, attachment). */
export const csvFile = z
  .object({ filename: z.string().min(1), csv: z.string() })
  .strict()
  .describe("text/csv attachment");

/** A status other than the route's default (e.g. 200 for a retried create that the route answers 201). */
export class Reply<T> {
  constructor(
    readonly status: number,
    readonly body: T,
  ) {}
}
export const reply = <T>(status: number, body: T) => new Reply(status, body);

type Schema = z.ZodType;
type In<S> = S extends Schema ? z.infer<S> : undefined;
/** What a handler may return for a response schema: its input type (e.g. a Date where the wire has a string). */
export type Answer<R extends Schema> = z.input<R> | Reply<z.input<R>>;

export type RouteContext<B, Q, P> = { req: Request; res: Response; body: In<B>; query: In<Q>; params: In<P> };
/** What a handler written apart from its route declares it reads: `Ctx<Body, Query, Params>` (types, not schemas). */
export type Ctx<B = unknown, Q = unknown, P = unknown> = { req: Request; res: Response; body: B; query: Q; params: P };

export type RouteSpec<B extends Schema | undefined, Q extends Schema | undefined, P extends Schema | undefined, R extends Schema> = {
  method: Method;
  /** Below /api, in Express syntax ("/greens/:id"). */
  path: string;
  /** Guards and middleware that run before the request is validated (requireUser, rate limits, uploads). */
  use?: RequestHandler[];
  /** Middleware that runs after the request is valid (e.g. an e-mail limiter that must not count refused requests). */
  after?: RequestHandler[];
  body?: B;
  query?: Q;
  /** Path parameters; a bad one is a 400 naming it (fields.id). */
  params?: P;
  response: R;
  /** The success status (default 200; 204 for `noContent`). */
  status?: number;
};

export type RouteHandler<B, Q, P, R extends Schema> = (ctx: RouteContext<B, Q, P>) => Answer<R> | Promise<Answer<R>>;

/** A route as the route table holds it: its schemas, and the handler bound to them. */
export type RouteDef = {
  method: Method;
  path: string;
  use: RequestHandler[];
  after: RequestHandler[];
  body?: Schema;
  query?: Schema;
  params?: Schema;
  response: Schema;
  status: number;
  handler: (ctx: RouteContext<unknown, unknown, unknown>) => unknown;
};

/**
 * Declares a route. TypeScript checks the handler against the schemas: `body`, `query` and `params` arrive
 * parsed and typed; the return value must be the response schema's input type.
 */
export function defineRoute<
  R extends Schema,
  B extends Schema | undefined = undefined,
  Q extends Schema | undefined = undefined,
  P extends Schema | undefined = undefined,
>(spec: RouteSpec<B, Q, P, R>, handler: RouteHandler<B, Q, P, R>): RouteDef {
  return {
    method: spec.method,
    path: spec.path,
    use: spec.use ?? [],
    after: spec.after ?? [],
    body: spec.body,
    query: spec.query,
    params: spec.params,
    response: spec.response,
    status: spec.status ?? ((spec.response as Schema) === noContent ? 204 : 200),
    handler: handler as RouteDef["handler"],
  };
}

/** Paths (a.b.0.c) of fields present in `sent` that the parsed value dropped: fields the schema does not describe. */
export function undescribedFields(sent: unknown, parsed: unknown, path: string[] = []): string[] {
  if (Array.isArray(sent) && Array.isArray(parsed)) return sent.flatMap((v, i) => undescribedFields(v, parsed[i], [...path, String(i)]));
  if (!isPlainObject(sent) || !isPlainObject(parsed)) return [];
  const out: string[] = [];
  for (const [k, v] of Object.entries(sent)) {
    if (v === undefined) continue; // JSON leaves it out anyway
    if (!(k in parsed)) out.push([...path, k].join("."));
    else out.push(...undescribedFields(v, parsed[k], [...path, k]));
  }
  return out;
}
const isPlainObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === "object" && v !== null && Object.getPrototypeOf(v) === Object.prototype;

/** The check outside production: the answer parses with its schema and carries no field the schema leaves out. */
export function checkResponse(def: Pick<RouteDef, "method" | "path" | "response">, value: unknown): void {
  const parsed = def.response.safeParse(value);
  const where = `${def.method.toUpperCase()} /api${def.path}`;
  if (!parsed.success) throw new Error(`${where} answered what its response schema refuses: ${z.prettifyError(parsed.error)}`);
  const extra = undescribedFields(value, parsed.data);
  if (extra.length > 0) throw new Error(`${where} answered fields its response schema does not describe: ${extra.join(", ")}`);
}

type Parsed = { body: unknown; query: unknown; params: unknown };

/** Parses body, query and params with the route's schemas (a 400 naming the field), before `after` and the handler. */
function validate(def: RouteDef): RequestHandler {
  return (req, res, next) => {
    const parsed: Parsed = {
      body: def.body ? parseOrThrow(def.body, req.body ?? {}, "request body") : undefined,
      query: def.query ? parseOrThrow(def.query, req.query, "query string") : undefined,
      params: def.params ? parseOrThrow(def.params, req.params, "path") : undefined,
    };
    res.locals.parsed = parsed;
    next();
  };
}

function expressHandler(def: RouteDef, checkResponses: boolean): RequestHandler {
  return async (req, res) => {
    const parsed = res.locals.parsed as Parsed;
    const out = await def.handler({ req, res, ...parsed } as RouteContext<unknown, unknown, unknown>);
    const status = out instanceof Reply ? out.status : def.status;
    const value = out instanceof Reply ? out.body : out;
    // The schema describes the route's answer; a refusal it sends itself (the import's 422 listing bad rows) is not it.
    if (checkResponses && status < 400) checkResponse(def, value);
    if (def.response === noContent) {
      res.status(status).end();
    } else if (def.response === csvFile) {
      const file = value as z.infer<typeof csvFile>;
      res.status(status);
      res.attachment(file.filename);
      res.setHeader("Content-Type", "text/csv; charset=utf-8");
      res.send(file.csv);
    } else {
      res.status(status).json(value);
    }
  };
}

/** An Express router serving the given routes. */
export function routerOf(defs: RouteDef[], options: { checkResponses: boolean }): Router {
  const router = Router();
  for (const def of defs)
    router[def.method](def.path, ...def.use, validate(def), ...def.after, expressHandler(def, options.checkResponses));
  return router;
}
