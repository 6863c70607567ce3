// Arranges documents waiting in To review, each with a stored suggestion (as the suggestion job
// would write it), so the queue's screen can be tested on many documents without OCR or a model.
import type { Knex } from "knex";
import { saveSuggestion } from "@/lib/data/suggestions";
import { insertReadDocument, typeIds } from "./filed-documents";

export interface QueueDocumentSpec {
  /** The suggested cabinet type first, then the runner-ups (names from db/demo/cabinet-types.ts). */
  ranked: string[];
  /** The file name (a marker in it lets a test find its own documents). */
  name: string;
  /** Matter numbers found in the text, best first; the first is the suggested matter unless `ambiguous`. */
  candidates?: string[];
  ambiguous?: boolean;
  confidence?: number;
}

export async function insertQueueDocument(db: Knex, spec: QueueDocumentSpec): Promise<number> {
  const types = await typeIds(db);
  const matters = new Map((await db("matters").select("id", "number")).map((m) => [m.number as string, m.id as number]));
  const id = await insertReadDocument(db, `Generated for the queue's tests: ${spec.name}. ${(spec.candidates ?? []).join(" ")}`, spec.name);
  const top = spec.confidence ?? 0.8;
  const candidates = (spec.candidates ?? []).map((n, i) => ({ matterId: matters.get(n)!, score: 1 - i * 0.1, reasons: ["matter number"] }));
  await saveSuggestion(null, null, {
    documentId: id,
    modelVersionId: null,
    method: "cold_start",
    ranked: spec.ranked.map((name, i) => ({ cabinetTypeId: types.get(name)!, confidence: i === 0 ? top : (1 - top) / 2 ** i, probability: null, source: "description" })),
    noConfidentMatch: false,
    modelConfidence: null,
    why: [],
    matterCandidates: candidates,
    topMatterId: candidates.length && !spec.ambiguous ? candidates[0].matterId : null,
    matterAmbiguous: Boolean(spec.ambiguous),
    autoFile: false,
  });
  return id;
}
