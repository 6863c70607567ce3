import mammoth from "mammoth";
import { checkZipLimits } from "./check-zip-limits";
import type { Deadline } from "./deadline";
import type { ReadOptions } from "./types";
import { describeDamagedDocx, UnreadableError } from "./unreadable";

export interface DocxText {
  text: string;
  /** Word files carry no fixed pages; a whole document counts as one. */
  pageCount: 1;
}

type DocxLimits = Pick<ReadOptions, "maxUnzippedBytes" | "maxZipEntries">;

export async function readDocx(bytes: Uint8Array, limits: DocxLimits, deadline: Deadline): Promise<DocxText> {
  checkZipLimits(bytes, limits);
  deadline.check();
  try {
    const result = await deadline.race(mammoth.extractRawText({ buffer: Buffer.from(bytes) }));
    return { text: result.value.trim(), pageCount: 1 };
  } catch (error) {
    if (error instanceof UnreadableError) throw error;
    // mammoth's errors here mean a zip without word/document.xml or XML it cannot parse.
    throw new UnreadableError("docx_damaged", describeDamagedDocx(), String(error));
  }
}
