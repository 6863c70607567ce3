// Lays demo blocks out as a Word file with the `docx` package. docx stamps the current time into
// docProps/core.xml and every zip entry, so the file is repacked with the document's own date:
// the same seed then gives the same bytes (and the same SHA-256 when seeds run twice).
import { AlignmentType, Document, HeadingLevel, Packer, PageBreak, Paragraph, Table, TableCell, TableRow, TextRun, WidthType } from "docx";
import JSZip from "jszip";
import type { Block } from "./doc-model";

export interface DocxStyle {
  font: "Calibri" | "Cambria" | "Georgia" | "Arial";
  /** Half-points, as Word counts them. */
  size: number;
}

const ALIGN = { left: AlignmentType.LEFT, right: AlignmentType.RIGHT, center: AlignmentType.CENTER } as const;

function toTable(rows: string[][], header: boolean): Table {
  return new Table({
    width: { size: 100, type: WidthType.PERCENTAGE },
    rows: rows.map(
      (row, r) =>
        new TableRow({
          children: row.map((cell) => new TableCell({ children: [new Paragraph({ children: [new TextRun({ text: cell, bold: header && r === 0 })] })] })),
        }),
    ),
  });
}

function toChildren(blocks: Block[]): (Paragraph | Table)[] {
  return blocks.flatMap((b): (Paragraph | Table)[] => {
    if (b.kind === "pageBreak") return [new Paragraph({ children: [new PageBreak()] })];
    if (b.kind === "heading") return [new Paragraph({ text: b.text, heading: HeadingLevel.HEADING_1 })];
    if (b.kind === "subheading") return [new Paragraph({ text: b.text, heading: HeadingLevel.HEADING_2 })];
    if (b.kind === "paragraph") return [new Paragraph({ children: [new TextRun(b.text)], spacing: { after: 160 } })];
    if (b.kind === "lines") return b.lines.map((line) => new Paragraph({ children: [new TextRun(line)], alignment: ALIGN[b.align ?? "left"] }));
    return [toTable(b.rows, b.header ?? false)];
  });
}

/** Rewrites a zip with one fixed date on every entry and in the core properties. */
async function fixTimestamps(bytes: Buffer, date: Date): Promise<Uint8Array> {
  const source = await JSZip.loadAsync(bytes);
  const out = new JSZip();
  const stamp = date.toISOString().replace(/\.\d{3}Z$/, "Z");
  for (const entry of Object.values(source.files)) {
    if (entry.dir) continue;
    let data: string | Uint8Array = await entry.async("uint8array");
    if (entry.name === "docProps/core.xml") {
      data = new TextDecoder().decode(data).replace(/(<dcterms:(?:created|modified)[^>]*>)[^<]*/g, `$1${stamp}`);
    }
    // Folder entries would carry the current time; Word needs none of them.
    out.file(entry.name, data, { date, createFolders: false });
  }
  return out.generateAsync({ type: "uint8array", compression: "DEFLATE", mimeType: "application/vnd.openxmlformats-officedocument.wordprocessingml.document" });
}

/** Renders blocks to DOCX bytes. */
export async function renderDocx(blocks: Block[], style: DocxStyle, info: { title: string; created: Date }): Promise<Uint8Array> {
  const doc = new Document({
    title: info.title,
    creator: "Foldwright demo",
    styles: { default: { document: { run: { font: style.font, size: style.size } } } },
    sections: [{ children: toChildren(blocks) }],
  });
  return fixTimestamps(await Packer.toBuffer(doc), info.created);
}
