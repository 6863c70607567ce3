// The CSRF check of every write through lib/http's handle(): a browser names the page a request
// comes from in `Origin` on every POST/PUT/PATCH/DELETE (Fetch standard, "origin" header), and in
// `Sec-Fetch-Site` (W3C Fetch Metadata) when it leaves Origin out. A write is taken only from the
// app's own origins (env.origins: APP_ORIGIN plus APP_ORIGINS), and only as JSON or multipart —
// the two bodies a cross-site HTML form cannot send without a CORS preflight (form enctypes are
// urlencoded, multipart and text/plain; multipart still needs the Origin to match).
import { env } from "@/lib/env";

const WRITES = new Set(["POST", "PUT", "PATCH", "DELETE"]);
const BODY_TYPES = new Set(["application/json", "multipart/form-data"]);

export interface CsrfRefusal {
  code: string;
  message: string;
}

function hasBody(headers: Headers): boolean {
  const length = headers.get("content-length");
  return (length !== null && length !== "0") || headers.has("transfer-encoding");
}

/** Why a write request must be refused (403), or null when it may go on. Reads headers only. */
export function csrfRefusal(request: Request): CsrfRefusal | null {
  if (!WRITES.has(request.method.toUpperCase())) return null;
  const origin = request.headers.get("origin");
  const sameSite = origin === null && request.headers.get("sec-fetch-site") === "same-origin";
  if (!sameSite && (origin === null || !env.origins.includes(origin))) {
    return {
      code: "cross_site",
      message:
        origin === null
          ? "This change was refused: the request does not say which page it came from (no Origin header). Make it from Foldwright itself; a script must send Origin with Foldwright's own address."
          : `This change was refused: it came from ${origin === "null" ? "a page with no address" : origin}, not from Foldwright. Make it from Foldwright itself; if Foldwright is reached at that address, add it to APP_ORIGINS.`,
    };
  }
  if (hasBody(request.headers)) {
    const type = (request.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
    if (!BODY_TYPES.has(type)) {
      return {
        code: "wrong_content_type",
        message: `This change was refused: its body is ${type ? `"${type}"` : "of no stated type"}. Send JSON (Content-Type: application/json) or a file upload (multipart/form-data).`,
      };
    }
  }
  return null;
}
