// A random session secret for a local start, kept under .data/ so sessions survive a restart.
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { env } from "@/lib/env";

export function localSessionSecret(): string {
  const file = path.join(env.dataDir, "session-secret");
  if (!fs.existsSync(file)) {
    fs.mkdirSync(env.dataDir, { recursive: true });
    fs.writeFileSync(file, crypto.randomBytes(32).toString("hex"), { mode: 0o600 });
  }
  return fs.readFileSync(file, "utf8").trim();
}
