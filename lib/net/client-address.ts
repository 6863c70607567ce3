// The client's address, for rate limits per address. Next.js fills X-Forwarded-For from the
// socket only when the request has none, so a client could name any address it likes. This
// module sets a header of our own on every incoming request before Next.js reads it: the
// socket's address, or — behind TRUSTED_PROXY_HOPS proxies that append to X-Forwarded-For —
// the address the outermost trusted proxy saw. A client's own copy of the header is replaced.
import http from "node:http";
import { env } from "@/lib/env";

export const CLIENT_ADDRESS_HEADER = "x-foldwright-client-address";

export function clientAddressFrom(socketAddress: string | undefined, forwardedFor: string | string[] | undefined, hops: number): string {
  if (hops > 0 && forwardedFor) {
    const list = (Array.isArray(forwardedFor) ? forwardedFor.join(",") : forwardedFor).split(",").map((s) => s.trim()).filter(Boolean);
    // Each trusted proxy appended the address it saw; the client controls only what is left of them.
    const seen = list[list.length - hops];
    if (seen) return seen;
  }
  return (socketAddress ?? "unknown").replace(/^::ffff:/, "");
}

const globalForAddress = globalThis as unknown as { foldwrightClientAddress?: boolean };

/** Once per process (instrumentation.ts): stamp every request's client address. */
export function installClientAddress(): void {
  if (globalForAddress.foldwrightClientAddress) return;
  globalForAddress.foldwrightClientAddress = true;
  const emit = http.Server.prototype.emit as (this: http.Server, event: string, ...args: unknown[]) => boolean;
  http.Server.prototype.emit = function (this: http.Server, event: string, ...args: unknown[]) {
    if (event === "request") {
      const req = args[0] as http.IncomingMessage;
      req.headers[CLIENT_ADDRESS_HEADER] = clientAddressFrom(req.socket?.remoteAddress, req.headers["x-forwarded-for"], env.trustedProxyHops);
    }
    return emit.call(this, event, ...args);
  } as typeof http.Server.prototype.emit;
}

/** The address installClientAddress stamped ("unknown" where it did not run, e.g. a test calling a handler). */
export function clientAddressOf(headers: Headers): string {
  return headers.get(CLIENT_ADDRESS_HEADER) ?? "unknown";
}
