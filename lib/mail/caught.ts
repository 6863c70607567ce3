// Reads what the local catcher caught (.eml files), for Setup › Outbox and the tests.
import fs from "node:fs";
import path from "node:path";
import { simpleParser } from "mailparser";

export interface CaughtMail {
  file: string;
  messageId: string;
  to: string[];
  from: string;
  subject: string;
  date: string | null;
  text: string;
}

function addresses(field: unknown): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a: { value?: { address?: string }[] }) => (a.value ?? []).map((v) => (v.address ?? "").toLowerCase()));
}

export async function readCaughtFile(dir: string, file: string): Promise<CaughtMail> {
  const parsed = await simpleParser(await fs.promises.readFile(path.join(dir, path.basename(file))));
  return {
    file: path.basename(file),
    messageId: parsed.messageId ?? "",
    to: addresses(parsed.to),
    from: addresses(parsed.from)[0] ?? "",
    subject: parsed.subject ?? "",
    date: parsed.date ? parsed.date.toISOString() : null,
    text: parsed.text ?? "",
  };
}

/** The newest caught messages first, at most `limit`. */
export async function listCaught(dir: string, limit = 200): Promise<CaughtMail[]> {
  let files: string[];
  try {
    files = (await fs.promises.readdir(dir)).filter((f) => f.endsWith(".eml")).sort().reverse().slice(0, limit);
  } catch {
    return [];
  }
  return Promise.all(files.map((f) => readCaughtFile(dir, f)));
}
