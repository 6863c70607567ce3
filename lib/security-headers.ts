// The security headers of every response. Pages get a Content Security Policy with a fresh nonce
// per request (proxy.ts; Next.js reads the nonce from the request's CSP header and puts it on its
// own scripts — node_modules/next/dist/docs/01-app/02-guides/content-security-policy.md), so no
// script runs that the server did not send in that very answer. API answers and downloads get a
// policy that allows nothing to run at all (next.config.mjs). The rest are fixed headers.
// Sources: W3C CSP Level 3 (nonces, 'strict-dynamic', frame-ancestors), RFC 7034 (X-Frame-Options),
// RFC 6797 (HSTS: ignored by browsers over plain HTTP, sent only over HTTPS here), Fetch standard
// (X-Content-Type-Options), W3C Referrer Policy, W3C Permissions Policy.

/** The page policy for one nonce. `dev` adds 'unsafe-eval', which React needs only in development. */
export function pagePolicy(nonce: string, options: { dev: boolean; https: boolean }): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${options.dev ? " 'unsafe-eval'" : ""}`,
    // Style elements need the nonce; style attributes (progress bars' widths) are allowed.
    `style-src 'self' 'nonce-${nonce}'`,
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(options.https ? ["upgrade-insecure-requests"] : []),
  ].join("; ");
}

/** A fresh, unguessable nonce (128 random bits, base64). */
export function newNonce(): string {
  return Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString("base64");
}

// Two years, the preload list's own minimum being one (hstspreload.org; from memory).
export const HSTS = "max-age=63072000; includeSubDomains";
