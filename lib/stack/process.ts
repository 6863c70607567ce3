// Small helpers for the start and test commands: wait for a port, run a command, find a binary.
import { spawn, type ChildProcess, type SpawnOptions } from "node:child_process";
import fs from "node:fs";
import net from "node:net";

export function isPortOpen(port: number, host = "127.0.0.1"): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ port, host });
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
    socket.setTimeout(1000, () => {
      socket.destroy();
      resolve(false);
    });
  });
}

export async function waitFor(what: string, check: () => Promise<boolean>, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${what} did not answer within ${Math.round(timeoutMs / 1000)} s.`);
}

export function findBinary(name: string, dirs = ["/usr/sbin", "/usr/bin", "/usr/local/bin", "/usr/local/sbin"]): string | null {
  for (const dir of dirs) {
    const full = `${dir}/${name}`;
    if (fs.existsSync(full)) return full;
  }
  return null;
}

/** Runs a command to completion; rejects with its output when it fails. */
export function run(cmd: string, args: string[], options: SpawnOptions = {}): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { ...options, stdio: ["ignore", "pipe", "pipe"] });
    let out = "";
    child.stdout?.on("data", (d) => (out += d));
    child.stderr?.on("data", (d) => (out += d));
    child.on("error", reject);
    child.on("close", (code) =>
      code === 0 ? resolve(out) : reject(new Error(`${cmd} ${args.join(" ")} exited with ${code}:\n${out}`)),
    );
  });
}

/** Stops a child we started, politely first. */
export async function stopChild(child: ChildProcess | undefined, timeoutMs = 10_000): Promise<void> {
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise<void>((r) => child.once("exit", () => r()));
  child.kill("SIGTERM");
  const timer = setTimeout(() => child.kill("SIGKILL"), timeoutMs);
  await exited;
  clearTimeout(timer);
}
