import { z } from "zod";
import { idSchema } from "../../shared/schemas/common";
import { parseOrThrow } from "../middleware/validate";

type WithParams = { params: Record<string, string | string[] | undefined> };

/** A path parameter parsed with its schema; a bad one is a 400 naming the parameter (e.g. fields.id). */
export function pathParam<S extends z.ZodType>(req: WithParams, name: string, schema: S): z.infer<S> {
  const parsed = parseOrThrow(z.object({ [name]: schema }), { [name]: req.params[name] }, "path");
  return (parsed as Record<string, z.infer<S>>)[name]!;
}

/** A uuid path parameter (default `id`). */
export function pathId(req: WithParams, name = "id"): string {
  return pathParam(req, name, idSchema);
}
