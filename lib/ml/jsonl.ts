// Reads data sets of JSON lines {"text": …, "label": …} (plus optional filename and meta) with
// errors that name the file, the line and the problem, for the command line.
import fs from "node:fs";
import type { LabelledDocument, MlDocument } from "./types";

/** Bad input a person can fix; the command line prints it on one line and exits with 2. */
export class InputError extends Error {}

/** Reads a file's text or explains why it cannot. */
function readText(path: string): string {
  try {
    return fs.readFileSync(path, "utf8");
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "it is a folder" : String(code ?? err);
    throw new InputError(`${path}: cannot read the file (${why}).`);
  }
}

/** Parses one line into a document; `needLabel` for training and evaluation data. */
function parseLine(line: string, where: string, needLabel: boolean): LabelledDocument | MlDocument {
  let value: unknown;
  try {
    value = JSON.parse(line);
  } catch {
    throw new InputError(`${where}: not valid JSON.`);
  }
  if (value === null || typeof value !== "object" || Array.isArray(value)) throw new InputError(`${where}: not a JSON object.`);
  const v = value as Record<string, unknown>;
  if (typeof v.text !== "string") throw new InputError(`${where}: no "text" string.`);
  if (needLabel && (typeof v.label !== "string" || v.label.trim() === "")) throw new InputError(`${where}: no "label" string.`);
  const doc: LabelledDocument = { text: v.text, label: typeof v.label === "string" ? v.label : "" };
  if (typeof v.filename === "string") doc.filename = v.filename;
  if (v.meta !== null && typeof v.meta === "object") doc.meta = v.meta as MlDocument["meta"];
  return doc;
}

/** Reads every non-blank line of a JSON-lines file. */
export function readJsonl(path: string, needLabel: boolean): LabelledDocument[] {
  const docs: LabelledDocument[] = [];
  readText(path)
    .split(/\r?\n/)
    .forEach((line, i) => {
      if (line.trim() !== "") docs.push(parseLine(line, `${path} line ${i + 1}`, needLabel) as LabelledDocument);
    });
  if (docs.length === 0) throw new InputError(`${path}: the file holds no documents.`);
  return docs;
}

/** Reads training data and checks that it has at least two labels. */
export function readTrainingJsonl(path: string): LabelledDocument[] {
  const docs = readJsonl(path, true);
  const labels = new Set(docs.map((d) => d.label));
  if (labels.size < 2) {
    throw new InputError(`${path}: all ${docs.length} documents have the label "${docs[0].label}"; training needs at least two labels.`);
  }
  return docs;
}
