// A tiny browser-like HTTP client: keeps cookies, sends an Origin header (better-auth refuses
// cookie-authenticated POSTs without one), and returns the parsed JSON body.
export type HttpResponse<T = any> = { status: number; headers: Headers; body: T };

export class HttpClient {
  private cookies = new Map<string, string>();
  constructor(readonly baseUrl: string) {}

  async request<T = any>(method: string, url: string, body?: unknown, headers: Record<string, string> = {}): Promise<HttpResponse<T>> {
    const h: Record<string, string> = { origin: this.baseUrl, ...headers };
    // An empty value leaves the header out (tests of requests without an Origin).
    for (const [k, v] of Object.entries(h)) if (v === "") delete h[k];
    if (this.cookies.size > 0) h.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
    let payload: BodyInit | undefined;
    if (body !== undefined) {
      if (typeof body === "string" || body instanceof FormData || body instanceof Uint8Array) payload = body as BodyInit;
      else {
        payload = JSON.stringify(body);
        h["content-type"] ??= "application/json";
      }
    }
    const res = await fetch(new URL(url, this.baseUrl), { method, headers: h, body: payload, redirect: "manual" });
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair!.indexOf("=");
      const name = pair!.slice(0, eq).trim();
      const value = pair!.slice(eq + 1).trim();
      if (value === "" || /max-age=0/i.test(line)) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
    const text = await res.text();
    let parsed: unknown = text;
    if ((res.headers.get("content-type") ?? "").includes("json") && text) parsed = JSON.parse(text);
    return { status: res.status, headers: res.headers, body: parsed as T };
  }
  get<T = any>(url: string) {
    return this.request<T>("GET", url);
  }
  post<T = any>(url: string, body?: unknown, headers?: Record<string, string>) {
    return this.request<T>("POST", url, body ?? {}, headers);
  }
  patch<T = any>(url: string, body?: unknown) {
    return this.request<T>("PATCH", url, body ?? {});
  }
  put<T = any>(url: string, body?: unknown) {
    return this.request<T>("PUT", url, body ?? {});
  }
  delete<T = any>(url: string) {
    return this.request<T>("DELETE", url);
  }
  /** A second client holding a copy of this one's cookies (a stolen cookie, in revocation tests). */
  copy(): HttpClient {
    const other = new HttpClient(this.baseUrl);
    for (const [k, v] of this.cookies) other.cookies.set(k, v);
    return other;
  }
  hasCookies(): boolean {
    return this.cookies.size > 0;
  }
}
