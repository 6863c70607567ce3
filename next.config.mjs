/** @type {import('next').NextConfig} */
const nextConfig = {
  // Packages with optional drivers, worker scripts or data files that must stay on disk
  // (see the project's STACK notes): bundling them breaks the build or the request.
  // pdfkit reads its standard fonts' metrics (.afm files) from its own folder at run time.
  // tsx and esbuild: lib/ml's training workers load TypeScript through tsx at run time.
  // @napi-rs/canvas and sharp: native addons (page previews), which Turbopack cannot bundle.
  serverExternalPackages: ["@napi-rs/canvas", "sharp", "knex", "mysql2", "tesseract.js", "pdf-parse", "wink-nlp", "wink-eng-lite-web-model", "s3rver", "bcryptjs", "tsx", "esbuild", "nodemailer", "smtp-server", "mailparser", "pdfkit"],
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // The fixed security headers of every answer (lib/security-headers.ts explains them). Pages get
  // their nonce-based CSP from proxy.ts; API answers and downloads run nothing, so theirs allows nothing.
  async headers() {
    const everywhere = [
      { key: "X-Content-Type-Options", value: "nosniff" },
      { key: "X-Frame-Options", value: "DENY" },
      { key: "Referrer-Policy", value: "same-origin" },
      { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=(), fullscreen=(self)" },
    ];
    return [
      { source: "/:path*", headers: everywhere },
      {
        source: "/api/:path*",
        headers: [{ key: "Content-Security-Policy", value: "default-src 'none'; img-src 'self'; media-src 'self'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'" }],
      },
      // HTTPS behind a TLS proxy, for the answers proxy.ts does not see (static files, uploads).
      {
        source: "/:path*",
        has: [{ type: "header", key: "x-forwarded-proto", value: "https" }],
        headers: [{ key: "Strict-Transport-Security", value: "max-age=63072000; includeSubDomains" }],
      },
    ];
  },
  // forbidden() answers a wrong role with a real 403 and app/forbidden.tsx.
  experimental: { authInterrupts: true },
  // `npm test` type-checks the whole project with tsc and lints it; the build need not repeat it.
  typescript: { ignoreBuildErrors: true },
};

export default nextConfig;
