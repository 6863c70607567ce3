// The local mail catcher: an SMTP server on 127.0.0.1 that accepts every message and writes it,
// unchanged, as an .eml file under MAIL_CATCHER_DIR (default .data/mail/). It stands in for the
// hosted mail service on a developer's machine and in the tests, which read what it caught.
import crypto from "node:crypto";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";
import { SMTPServer } from "smtp-server";

export interface MailCatcher {
  port: number;
  dir: string;
  startedHere: boolean;
  stop(): Promise<void>;
}

function answers(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host: "127.0.0.1", port }, () => {
      socket.destroy();
      resolve(true);
    });
    socket.on("error", () => resolve(false));
  });
}

/** Starts the catcher, or reuses one already answering on the port (another command started it). */
export async function startMailCatcher(port: number, dir: string): Promise<MailCatcher> {
  fs.mkdirSync(dir, { recursive: true });
  if (await answers(port)) return { port, dir, startedHere: false, stop: async () => {} };
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    banner: "Foldwright mail catcher (local only)",
    logger: false,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        // Time first so a directory listing is in arrival order; the random part keeps names unique.
        const name = `${new Date().toISOString().replace(/[:.]/g, "-")}-${crypto.randomBytes(4).toString("hex")}.eml`;
        fs.promises.writeFile(path.join(dir, name), Buffer.concat(chunks)).then(() => callback(), callback);
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  server.on("error", (e) => console.error("[mail catcher]", e.message));
  return { port, dir, startedHere: true, stop: () => new Promise((resolve) => server.close(() => resolve())) };
}
