// The one network mock for component tests (issue 16): Mock Service Worker's request interception in Node.
// tests/setup/unit.ts starts it for every jsdom test file with `onUnhandledRequest: "error"`, so a request no
// handler answers fails the test (MSW reports it with console.error, which the setup turns into a failure).
// A test adds its answers with `network.use(http.get("/api/...", () => HttpResponse.json(...)))`; they are reset
// after each test. Paths are relative to the jsdom page (http://localhost:3000), as the app's requests are.
import { vi } from "vitest";
import { delay, http, HttpResponse, type JsonBodyType, type RequestHandler } from "msw";
import { setupServer } from "msw/node";
import type { ApiErrorBody, ErrorCode } from "../../shared/errors";

export { delay, http, HttpResponse, type JsonBodyType };

export const network = setupServer();

/** An answer in the API's one error shape (shared/errors.ts), e.g. `apiError(404, "not_found", "Invitation was not found.")`. */
export function apiError(status: number, code: ErrorCode, message: string, more: Omit<ApiErrorBody["error"], "code" | "message"> = {}) {
  const body: ApiErrorBody = { error: { code, message, ...more } };
  return HttpResponse.json(body, { status });
}

/** GET /api/me as the server answers it: signed out is `{ user: null, preferences: null }` (a 200). */
export function meAnswer(me: JsonBodyType | null) {
  return http.get("/api/me", () => HttpResponse.json(me ?? { user: null, preferences: null }));
}

/** One request as the app sent it: method, path, query and body (JSON parsed; undefined without one). */
export type Call = { method: string; path: string; query: URLSearchParams; body: unknown };

/**
 * Answers with `handlers` (network.use) and returns the log of every request, in the order sent, each recorded
 * before any handler answers it. A request that no handler answers is still logged, and still fails the test.
 */
export function serve(...handlers: RequestHandler[]): Call[] {
  const calls: Call[] = [];
  network.use(...handlers);
  // Prepended last, so it sees every request first; answering nothing passes the request on to the next handler.
  network.use(
    http.all("*", async ({ request }) => {
      const url = new URL(request.url);
      const text = await request.clone().text();
      const json = request.headers.get("Content-Type")?.includes("json");
      calls.push({
        method: request.method,
        path: url.pathname,
        query: url.searchParams,
        body: text && json ? JSON.parse(text) : undefined,
      });
    }),
  );
  return calls;
}

/**
 * The multipart forms the app hands to `fetch`, as it built them (MSW still answers the request). Upload tests read
 * the form here because jsdom's File does not survive Node's multipart encoding: its bytes reach a handler as
 * "undefined" and its name as "blob", which a browser never sends.
 */
export function watchUploads(): { path: string; form: FormData }[] {
  const forms: { path: string; form: FormData }[] = [];
  if (vi.isMockFunction(globalThis.fetch)) vi.mocked(globalThis.fetch).mockRestore(); // a second watch in one test starts afresh
  const intercepted = globalThis.fetch; // MSW's, installed by network.listen()
  vi.spyOn(globalThis, "fetch").mockImplementation((input, init) => {
    const url = new URL(input instanceof Request ? input.url : String(input), window.location.href);
    if (init?.body instanceof FormData) forms.push({ path: url.pathname, form: init.body });
    return intercepted(input, init);
  });
  return forms;
}
