// Input checks before any work, with sentences a person can act on (STYLE.md).
import type { LabelledDocument, MlDocument } from "./types";

/** Throws unless doc is a usable document; `where` names it in the message. */
export function checkDocument(doc: MlDocument, where: string): void {
  if (doc === null || typeof doc !== "object") throw new Error(`${where} is not an object.`);
  if (typeof doc.text !== "string") throw new Error(`${where} has no text.`);
  if (doc.filename !== undefined && typeof doc.filename !== "string") throw new Error(`${where} has a filename that is not text.`);
  if (doc.heading !== undefined && typeof doc.heading !== "string") throw new Error(`${where} has a heading that is not text.`);
  const pages = doc.meta?.pages;
  if (pages !== undefined && !(typeof pages === "number" && Number.isFinite(pages) && pages >= 0)) {
    throw new Error(`${where} has a page count that is not a number ≥ 0 (${String(pages)}).`);
  }
}

/** Throws unless docs is a non-empty list of labelled documents with at least two labels. */
export function checkTrainingSet(docs: LabelledDocument[]): void {
  if (!Array.isArray(docs) || docs.length === 0) throw new Error("There are no documents to train on.");
  docs.forEach((d, i) => {
    checkDocument(d, `Document ${i + 1}`);
    if (typeof d.label !== "string" || d.label.trim() === "") throw new Error(`Document ${i + 1} has no label.`);
  });
  const labels = new Set(docs.map((d) => d.label));
  if (labels.size < 2) {
    throw new Error(`All documents have the label "${docs[0].label}"; training needs at least two different labels.`);
  }
}

/** Throws unless there is one non-empty label per row and at least two different labels. */
export function checkLabels(labels: string[], rows: number): void {
  if (rows === 0) throw new Error("There are no documents to train on.");
  if (labels.length !== rows) throw new Error(`There are ${rows} documents but ${labels.length} labels; give one label per document.`);
  labels.forEach((l, i) => {
    if (typeof l !== "string" || l.trim() === "") throw new Error(`Document ${i + 1} has no label.`);
  });
  if (new Set(labels).size < 2) throw new Error(`All documents have the label "${labels[0]}"; training needs at least two different labels.`);
}
