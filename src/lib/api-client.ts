// The one fetch wrapper for Borrowline's JSON API. It never shows UI: callers and the
// query client decide what to do with an ApiError.

export type FieldErrors = Record<string, string>;

export class ApiError extends Error {
  override readonly name = "ApiError";
  readonly status: number;
  readonly code: string;
  readonly fields: FieldErrors;
  /** The parsed error body as the server sent it, for answers that carry more than the error (a CSV import's row errors). */
  readonly body: unknown;

  constructor(status: number, code: string, message: string, fields: FieldErrors = {}, body?: unknown) {
    super(message);
    this.status = status;
    this.code = code;
    this.fields = fields;
    this.body = body;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

const FALLBACK_MESSAGES: Record<number, string> = {
  400: "The request was not accepted.",
  401: "Please sign in to continue.",
  403: "You do not have access to this.",
  404: "That could not be found.",
  409: "That conflicts with something that already exists.",
  413: "That upload is too large.",
  415: "That kind of file is not accepted.",
  422: "That request cannot be worked out.",
  429: "Too many requests. Please wait a moment and try again.",
};

function fallbackMessage(status: number): string {
  return FALLBACK_MESSAGES[status] ?? (status >= 500 ? "The server had a problem. Please try again." : `Request failed (${status}).`);
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function readFields(value: unknown): FieldErrors {
  if (!isRecord(value)) return {};
  const fields: FieldErrors = {};
  for (const [key, why] of Object.entries(value)) {
    if (typeof why === "string") fields[key] = why;
    else if (Array.isArray(why) && typeof why[0] === "string") fields[key] = why[0];
  }
  return fields;
}

/** Turns a failed response's status and body into an ApiError.
 *  Understands `{"error":{"code","message","fields"}}` and, as a fallback, a flat `{"code","message"}`. */
export function toApiError(status: number, body: unknown): ApiError {
  const inner = isRecord(body) && isRecord(body.error) ? body.error : isRecord(body) ? body : undefined;
  const code = inner && typeof inner.code === "string" && inner.code ? inner.code : `HTTP_${status}`;
  const message = inner && typeof inner.message === "string" && inner.message ? inner.message : fallbackMessage(status);
  const fields = inner ? readFields(inner.fields) : {};
  return new ApiError(status, code, message, fields, body);
}

export type RequestOptions = {
  method?: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  body?: unknown;
  query?: Record<string, string | number | boolean | undefined>;
  signal?: AbortSignal;
  headers?: Record<string, string>;
};

function withQuery(url: string, query: RequestOptions["query"]): string {
  if (!query) return url;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined) params.set(key, String(value));
  }
  const qs = params.toString();
  return qs ? `${url}${url.includes("?") ? "&" : "?"}${qs}` : url;
}

async function readBody(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}

/** Calls the API and resolves with the parsed JSON body; rejects with an ApiError. */
export async function apiRequest<T>(url: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: "application/json", ...options.headers };
  let body: BodyInit | undefined;
  if (options.body instanceof FormData) {
    body = options.body;
  } else if (options.body !== undefined) {
    headers["Content-Type"] = "application/json";
    body = JSON.stringify(options.body);
  }

  let response: Response;
  try {
    response = await fetch(withQuery(url, options.query), {
      method: options.method ?? (body === undefined ? "GET" : "POST"),
      headers,
      body,
      credentials: "same-origin",
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === "AbortError") throw cause;
    throw new ApiError(0, "NETWORK_ERROR", "Could not reach Borrowline. Check your connection and try again.");
  }

  const data = await readBody(response);
  if (!response.ok) throw toApiError(response.status, data);
  return data as T;
}

export const api = {
  get: <T>(url: string, options?: Omit<RequestOptions, "method" | "body">) => apiRequest<T>(url, { ...options, method: "GET" }),
  post: <T>(url: string, body?: unknown, options?: Omit<RequestOptions, "method" | "body">) =>
    apiRequest<T>(url, { ...options, method: "POST", body }),
  put: <T>(url: string, body?: unknown, options?: Omit<RequestOptions, "method" | "body">) =>
    apiRequest<T>(url, { ...options, method: "PUT", body }),
  patch: <T>(url: string, body?: unknown, options?: Omit<RequestOptions, "method" | "body">) =>
    apiRequest<T>(url, { ...options, method: "PATCH", body }),
  delete: <T>(url: string, options?: Omit<RequestOptions, "method" | "body">) => apiRequest<T>(url, { ...options, method: "DELETE" }),
};

/** The file name from a Content-Disposition header (`attachment; filename="x.csv"`), or null. */
export function attachmentName(header: string | null): string | null {
  if (!header) return null;
  const star = /filename\*=(?:UTF-8'')?([^;]+)/i.exec(header);
  if (star?.[1]) {
    try {
      return decodeURIComponent(star[1].trim().replace(/^"|"$/g, ""));
    } catch {
      // fall through to the plain filename
    }
  }
  const plain = /filename="?([^";]+)"?/i.exec(header);
  return plain?.[1]?.trim() || null;
}

/**
 * Downloads a file the API answers (a CSV export) and hands it to the browser as a download.
 * Resolves with the file name used; rejects with an ApiError like every other call.
 */
export async function downloadFile(url: string, options: { query?: RequestOptions["query"]; fallbackName?: string } = {}): Promise<string> {
  let response: Response;
  try {
    response = await fetch(withQuery(url, options.query), { method: "GET", credentials: "same-origin" });
  } catch {
    throw new ApiError(0, "NETWORK_ERROR", "Could not reach Borrowline. Check your connection and try again.");
  }
  if (!response.ok) throw toApiError(response.status, await readBody(response));
  const name = attachmentName(response.headers.get("Content-Disposition")) ?? options.fallbackName ?? "download";
  const blob = await response.blob();
  const href = URL.createObjectURL(blob);
  try {
    const a = document.createElement("a");
    a.href = href;
    a.download = name;
    a.rel = "noopener";
    document.body.append(a);
    a.click();
    a.remove();
  } finally {
    // Give the browser a moment to start the download before the object URL goes.
    setTimeout(() => URL.revokeObjectURL(href), 10_000);
  }
  return name;
}
