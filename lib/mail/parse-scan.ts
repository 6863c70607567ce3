// Takes a received message apart into the files it carries. Inline images that the message's own
// HTML shows (a signature's logo, marked "related") are part of the letter, not scans to file.
import { simpleParser } from "mailparser";

export interface ScanAttachment {
  name: string;
  bytes: Uint8Array;
}

export interface ParsedScanMessage {
  subject: string | null;
  attachments: ScanAttachment[];
}

export async function parseScanMessage(raw: Buffer): Promise<ParsedScanMessage> {
  const parsed = await simpleParser(raw, { skipHtmlToText: true, skipTextToHtml: true, skipTextLinks: true });
  const attachments = parsed.attachments
    .filter((a) => !a.related)
    .map((a, i) => ({ name: a.filename || `attachment-${i + 1}`, bytes: new Uint8Array(a.content) }));
  return { subject: parsed.subject ?? null, attachments };
}
