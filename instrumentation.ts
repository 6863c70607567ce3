// Next.js calls register() once per server process: stamp each request's client address (for
// rate limits; lib/net/client-address.ts) and start the background workers, so every app
// instance also reads documents unless JOBS_ENABLED=false.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { installClientAddress } = await import("@/lib/net/client-address");
    installClientAddress();
    const { startBackgroundWork } = await import("@/lib/jobs/start");
    startBackgroundWork();
  }
}
