// Build-time rendering of the pages a first-time visitor lands on (issue 18: a first load that does not wait). The
// HTML of "/" and "/read", as a signed-out visitor first sees them, is written into the page the server sends, so the
// heading and text paint as soon as the HTML and CSS arrive; src/main.tsx then hydrates it instead of drawing it
// again. Run by scripts/prerender.ts after `vite build`; never loaded in the browser.
import "./lib/zod-config";
import { prerenderToNodeStream } from "react-dom/static";
import { createStaticHandler, createStaticRouter, StaticRouterProvider } from "react-router";
import { App } from "./app/app";
import { createAppRoutes } from "./app/router";
import { answerRead } from "#shared/read-answers";
import type { ReadRequest } from "#shared/schemas/reads";
import { readsKeys } from "./features/reads/api/keys";
import type { DrawnQuery } from "./lib/drawn-queries";
import { createQueryClient } from "./lib/query-client";

/** The app's HTML for `url` (an absolute URL) for a visitor who is not signed in, as the browser's first render draws
 *  it, and the answers it shows. A read the page asks for is answered here, by the same code as the API
 *  (shared/read-answers.ts): the page is drawn once to find what it asks, then again with the answers. */
export async function renderPage(url: string): Promise<{ html: string; queries: DrawnQuery[] }> {
  const { query, dataRoutes } = createStaticHandler(createAppRoutes());
  const context = await query(new Request(url));
  if (context instanceof Response) throw new Error(`${url} redirects (${context.status}); only plain pages are prerendered`);
  if (context.statusCode !== 200) throw new Error(`${url} answers ${context.statusCode}; only plain pages are prerendered`);
  const queryClient = createQueryClient();
  const draw = async () => {
    const router = createStaticRouter(dataRoutes, context);
    // The same tree as src/main.tsx. `hydrate` off: the router's state is not written into the page as an inline
    // script (the Content-Security-Policy forbids one); the client rebuilds it from the URL, which is all a page
    // without loaders needs.
    // Every Suspense boundary (src/lib/drawn-part.tsx) is written finished, in place: never split out to be moved by an
    // inline script.
    const { prelude } = await prerenderToNodeStream(
      <App router={<StaticRouterProvider router={router} context={context} hydrate={false} />} signedOut queryClient={queryClient} />,
      { progressiveChunkSize: Number.POSITIVE_INFINITY },
    );
    const chunks: Buffer[] = [];
    for await (const chunk of prelude) chunks.push(Buffer.from(chunk as Uint8Array));
    return Buffer.concat(chunks).toString("utf8");
  };

  const first = await draw();
  const queries: DrawnQuery[] = [];
  for (const asked of queryClient.getQueryCache().findAll({ queryKey: readsKeys.solves() })) {
    const request = asked.queryKey[2] as ReadRequest | null;
    if (!request) continue;
    const answer = answerRead(request);
    if (!answer.ok) continue;
    // As the browser would receive it from the API: through JSON.
    const data: unknown = JSON.parse(JSON.stringify(answer.response));
    queryClient.setQueryData(asked.queryKey, data);
    queries.push({ queryKey: asked.queryKey, data });
  }
  return { html: queries.length > 0 ? await draw() : first, queries };
}
