// Polls `probe` until it answers something truthy, or fails after `ms` naming what it waited for.
export async function waitUntil<T>(what: string, probe: () => Promise<T | undefined | false | null>, ms: number, everyMs: number): Promise<T> {
  const deadline = Date.now() + ms;
  for (;;) {
    const v = await probe();
    if (v) return v;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, everyMs));
  }
}
