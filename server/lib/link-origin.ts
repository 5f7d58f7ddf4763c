// Where e-mailed links point. With BASE_URL: always there. Without it: the address the app was reached at (the
// request's Host), but only when that origin is one this server trusts — its own loopback names and, when it
// listens on every interface, this machine's own addresses and host name. An untrusted Host (a forged header, a
// DNS name pointing at us) never reaches a link: it would let anyone send a victim a reset link to their own site.
import os from "node:os";
import type { Request } from "express";

export type LinkOrigins = {
  /** BASE_URL's origin, when set: every link uses it. */
  fixed?: string;
  /** Used when the request's origin is not trusted (or there is no request). */
  fallback: string;
  /** Origins a link may use (and from which signed-in writes are accepted). */
  trusted: string[];
};

type Interfaces = ReturnType<typeof os.networkInterfaces>;

function hostPart(address: string): string {
  return address.includes(":") ? `[${address}]` : address;
}

/**
 * The origins this server answers at without BASE_URL: localhost and 127.0.0.1 always; when bound to every
 * interface (0.0.0.0 / ::), each of this machine's IPv4 addresses, its IPv6 addresses (not link-local) and its
 * host name; when bound to one address, that address.
 */
export function localOrigins(
  host: string,
  port: number,
  interfaces: Interfaces = os.networkInterfaces(),
  hostname = os.hostname(),
): string[] {
  const hosts = ["localhost", "127.0.0.1"];
  if (host === "0.0.0.0" || host === "::" || host === "") {
    for (const list of Object.values(interfaces)) {
      for (const a of list ?? []) {
        if (a.internal) continue;
        if (a.family === "IPv6" && a.address.toLowerCase().startsWith("fe80")) continue; // needs a zone id in a URL
        if (a.family === "IPv6" && host === "0.0.0.0") continue; // 0.0.0.0 binds IPv4 only
        hosts.push(hostPart(a.address));
      }
    }
    if (hostname && /^[a-z0-9.-]+$/i.test(hostname)) hosts.push(hostname.toLowerCase());
  } else if (host !== "localhost" && host !== "127.0.0.1") {
    hosts.push(hostPart(host));
  }
  return [...new Set(hosts.map((h) => new URL(`http://${h}:${port}`).origin))];
}

/** The origin a request reached us at, or null when it cannot be read as one. */
export function requestOrigin(protocol: string, host: string | undefined | null): string | null {
  if (!host) return null;
  try {
    const url = new URL(`${protocol.replace(/:$/, "")}://${host}`);
    // A Host header is host[:port] and nothing else.
    if (url.username || url.password || url.pathname !== "/" || url.search || url.hash) return null;
    return url.origin;
  } catch {
    return null;
  }
}

/** The origin for links in a mail sent while answering a request that reached us at `reached` (or none). */
export function linkOrigin(origins: LinkOrigins, reached: string | null | undefined): string {
  if (origins.fixed) return origins.fixed;
  if (reached && origins.trusted.includes(reached)) return reached;
  return origins.fallback;
}

/** A link built by someone else (better-auth) moved onto the chosen origin; path and query kept. */
export function onOrigin(link: string, origin: string): string {
  const url = new URL(link);
  const target = new URL(origin);
  url.protocol = target.protocol;
  url.host = target.host;
  return url.toString();
}

/** The origin for links in a mail sent while answering this Express request. */
export function linkBase(origins: LinkOrigins, req: Request): string {
  return linkOrigin(origins, requestOrigin(req.protocol, req.get("host")));
}

/** The same for a web Request (better-auth's callbacks): the Host header and the URL's scheme. */
export function linkBaseForWebRequest(origins: LinkOrigins, request: globalThis.Request | undefined): string {
  if (!request) return linkOrigin(origins, null);
  let protocol = "http";
  try {
    protocol = new URL(request.url).protocol;
  } catch {
    // keep http
  }
  return linkOrigin(origins, requestOrigin(protocol, request.headers.get("host")));
}
