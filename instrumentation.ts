// Next.js calls register() once per server process: start the background workers there, so
// every app instance also reads documents unless JOBS_ENABLED=false.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { startBackgroundWork } = await import("@/lib/jobs/start");
    startBackgroundWork();
  }
}
