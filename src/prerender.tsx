// Build-time rendering of the pages a first-time visitor lands on (issue 18: a first load that does not wait). The
// HTML of "/" and "/read", as a signed-out visitor first sees them, is written into the page the server sends, so the
// heading and text paint as soon as the HTML and CSS arrive; src/main.tsx then hydrates it instead of drawing it
// again. Run by scripts/prerender.ts after `vite build`; never loaded in the browser.
import "./lib/zod-config";
import { prerenderToNodeStream } from "react-dom/static";
import { createStaticHandler, createStaticRouter, StaticRouterProvider } from "react-router";
import { App } from "./app/app";
import { createAppRoutes } from "./app/router";

/** The app's HTML for `url` (an absolute URL) for a visitor who is not signed in, before any data has arrived, as
 *  the browser's first render draws it. */
export async function renderPage(url: string): Promise<string> {
  const { query, dataRoutes } = createStaticHandler(createAppRoutes());
  const context = await query(new Request(url));
  if (context instanceof Response) throw new Error(`${url} redirects (${context.status}); only plain pages are prerendered`);
  if (context.statusCode !== 200) throw new Error(`${url} answers ${context.statusCode}; only plain pages are prerendered`);
  const router = createStaticRouter(dataRoutes, context);
  // The same tree as src/main.tsx. `hydrate` off: the router's state is not written into the page as an inline
  // script (the Content-Security-Policy forbids one); the client rebuilds it from the URL, which is all a page
  // without loaders needs.
  const { prelude } = await prerenderToNodeStream(
    <App router={<StaticRouterProvider router={router} context={context} hydrate={false} />} signedOut />,
  );
  const chunks: Buffer[] = [];
  for await (const chunk of prelude) chunks.push(Buffer.from(chunk as Uint8Array));
  return Buffer.concat(chunks).toString("utf8");
}
