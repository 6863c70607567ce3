// Invented office documents for the demo seeds and benchmarks: for each document a cabinet type
// (types taken in shuffled rounds, so every type appears once count ≥ the number of types), a
// matter (half the time one whose title fits the type, e.g. payroll papers to the payroll
// matter), a template of that type, a layout, and PDF (pdfkit) or Word (docx) bytes. The same
// seed gives the same documents, byte for byte.
import { DEMO_CABINET_TYPES } from "@/db/demo/cabinet-types";
import { createContext, type DemoMatterInput } from "./context";
import { listDemoMatters } from "./demo-matters";
import { toPlainText, type DemoDoc } from "./doc-model";
import { createRandom, formatDate, type Random } from "./random";
import { renderDocx, type DocxStyle } from "./render-docx";
import { renderPdf, type PdfStyle } from "./render-pdf";
import { findTemplates } from "./templates";

export type { DemoMatterInput } from "./context";

export interface DemoTypeInput {
  name: string;
  description?: string;
  keywords?: string[];
}

export interface DemoDocument {
  fileName: string;
  kind: "pdf" | "docx";
  bytes: Uint8Array;
  cabinetTypeName: string;
  matterNumber: string;
  /** The text a reader finds in the file (whitespace aside). */
  text: string;
}

export interface DemoOptions {
  count: number;
  seed: number;
  /** Default: the ten demo cabinet types. */
  types?: DemoTypeInput[];
  /** Default: the demo office's matters. */
  matters?: DemoMatterInput[];
}

const PDF_SHARE = 0.6;
// Real intake is full of "scan_0042.pdf": a file name that gives the type away would make the
// demo model look better than it will be.
const NEUTRAL_NAME_SHARE = 0.4;

const stems = (text: string) => new Set(text.toLowerCase().split(/[^a-z]+/).filter((w) => w.length >= 4).map((w) => w.slice(0, 5)));

/** A matter for a type: half the time one whose title shares a word with the type's name. */
function pickMatter(rng: Random, type: DemoTypeInput, matters: DemoMatterInput[]): DemoMatterInput {
  const typeStems = stems(type.name);
  const fitting = matters.filter((m) => [...stems(m.title)].some((s) => typeStems.has(s)));
  return fitting.length > 0 && rng.chance(0.5) ? rng.pick(fitting) : rng.pick(matters);
}

function chooseFileName(rng: Random, doc: DemoDoc, matter: DemoMatterInput, date: Date, index: number, ext: string): string {
  const n = String(index + 1).padStart(4, "0");
  if (rng.chance(NEUTRAL_NAME_SHARE)) return `${rng.pick(["scan", "doc", "IMG", "upload", "Scanned"])}_${formatDate(date, 1).replace(/-/g, "")}_${n}.${ext}`;
  const slug = doc.fileStem.toLowerCase().replace(/[^a-z0-9]+/g, "_").replace(/^_|_$/g, "");
  return `${rng.chance(0.2) ? `${matter.number}_` : ""}${slug}_${n}.${ext}`;
}

/** Generates `count` invented documents, the same ones for the same seed. */
export async function generateDemoDocuments(options: DemoOptions): Promise<DemoDocument[]> {
  const types = options.types ?? DEMO_CABINET_TYPES;
  const matters = options.matters ?? listDemoMatters();
  if (!Number.isInteger(options.count) || options.count < 0) throw new Error(`count must be a whole number of documents (0 or more), got ${options.count}.`);
  if (options.count > 0 && (types.length === 0 || matters.length === 0)) throw new Error("Generating documents needs at least one cabinet type and one matter.");
  const rng = createRandom(options.seed);
  const out: DemoDocument[] = [];
  let round: DemoTypeInput[] = [];
  for (let i = 0; i < options.count; i++) {
    if (round.length === 0) round = rng.shuffle(types);
    const type = round.pop()!;
    const matter = pickMatter(rng, type, matters);
    const ctx = createContext(rng, matter);
    const doc = rng.pick(findTemplates(type))(ctx);
    const kind = rng.chance(PDF_SHARE) ? "pdf" : "docx";
    const info = { title: doc.fileStem, created: ctx.date };
    const bytes =
      kind === "pdf"
        ? await renderPdf(doc.blocks, rng.pick<PdfStyle>([{ font: "Helvetica", size: 11, margin: 60 }, { font: "Times-Roman", size: 12, margin: 72 }, { font: "Courier", size: 10, margin: 54 }, { font: "Helvetica", size: 10, margin: 48 }]), info)
        : await renderDocx(doc.blocks, rng.pick<DocxStyle>([{ font: "Calibri", size: 22 }, { font: "Cambria", size: 24 }, { font: "Georgia", size: 21 }, { font: "Arial", size: 20 }]), info);
    out.push({ fileName: chooseFileName(rng, doc, matter, ctx.date, i, kind), kind, bytes, cabinetTypeName: type.name, matterNumber: matter.number, text: toPlainText(doc.blocks) });
  }
  return out;
}
