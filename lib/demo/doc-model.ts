// The layout-free shape of a demo document: the templates write blocks, the PDF and Word
// renderers lay them out, and the plain text is derived from the same blocks, so the `text` of
// a generated document is exactly what a reader should find in the file.

export type Block =
  | { kind: "heading"; text: string }
  | { kind: "subheading"; text: string }
  | { kind: "paragraph"; text: string }
  /** Short lines kept as they are: letterheads, addresses, signature blocks. */
  | { kind: "lines"; lines: string[]; align?: "left" | "right" | "center" }
  /** Rows of cells; the first row is a header when `header` is set. */
  | { kind: "table"; rows: string[][]; header?: boolean }
  | { kind: "pageBreak" };

export interface DemoDoc {
  /** A few words for the file name, e.g. "invoice 2291". */
  fileStem: string;
  blocks: Block[];
}

/** The text a reader finds in the rendered file, one block after another. */
export function toPlainText(blocks: Block[]): string {
  const parts: string[] = [];
  for (const b of blocks) {
    if (b.kind === "pageBreak") continue;
    if (b.kind === "lines") parts.push(b.lines.join("\n"));
    else if (b.kind === "table") parts.push(b.rows.map((r) => r.join("  ")).join("\n"));
    else parts.push(b.text);
  }
  return parts.join("\n\n");
}
