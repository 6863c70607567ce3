import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";

// The tokenizer, watched: every call is counted, and the texts it was given are kept.
const seen = vi.hoisted(() => ({ texts: [] as string[] }));
vi.mock("@/lib/ml/tokenize", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/ml/tokenize")>();
  return {
    ...real,
    tokenizeDocument: vi.fn((doc: { text: string }, options?: Parameters<typeof real.tokenizeDocument>[1]) => {
      seen.texts.push(doc.text);
      return real.tokenizeDocument(doc as Parameters<typeof real.tokenizeDocument>[0], options);
    }),
  };
});

import { closeDb } from "@/db";
import { claimJobs, enqueueJob } from "@/lib/data/jobs";
import { loadTrainingCounts, whereHumanFiled } from "@/lib/data/training-set";
import { mlDocumentOf, queueRetokenizing, tokenizeDocuments } from "@/lib/data/document-terms";
import { saveReading } from "@/lib/data/reading";
import { tokenizeJob } from "@/lib/jobs/tokenize-job";
import { requestRetrain, runTraining } from "@/lib/learning/retrain";
import { forgetServingModel } from "@/lib/learning/model-store";
import { allRows, decodeTermCounts, TOKENIZER_VERSION, trainModel, trainOnCounts } from "@/lib/ml";
import { tokenizeDocument } from "@/lib/ml/tokenize";
import { ownerDb } from "../helpers/db";
import { insertFiledDocuments, insertReadDocument } from "../helpers/filed-documents";

// Tokenise once (issue 14): counts stored when a document is read, re-made by background jobs
// when the tokenizer's version changes, and a retraining that reads them without tokenising.
const owner = ownerDb();
const fresh = (text: string, name: string) => {
  const counts = new Map<string, number>();
  for (const t of tokenizeDocument(mlDocumentOf({ text, original_name: name, media_type: "application/pdf", page_count: 1, ocr_used: 0 }))) counts.set(t, (counts.get(t) ?? 0) + 1);
  return counts;
};
const storedOf = async (id: number) => owner("document_terms").where({ document_id: id }).first();

async function runTokenizeJobs(): Promise<number> {
  let ran = 0;
  for (;;) {
    const jobs = await claimJobs("test-tokenizer", ["tokenize"], 5, 60);
    if (jobs.length === 0) return ran;
    for (const job of jobs) await tokenizeJob.run(job, "test-tokenizer");
    ran += jobs.length;
  }
}

beforeAll(async () => {
  await owner("jobs").where({ kind: "tokenize" }).delete();
  await owner("model_versions").update({ status: "retired" });
  await insertFiledDocuments(owner, 12);
  forgetServingModel();
});
afterAll(async () => {
  await owner("jobs").whereIn("kind", ["tokenize", "train", "read"]).delete();
  await owner.destroy();
  await closeDb();
});

describe("stored term counts", () => {
  it("are stored with the text when a document is read, and equal a fresh tokenisation", async () => {
    const text = "Invoice 4471. Amount due 1,200.00; remit payment within 30 days. Net 30. Line item: audit fee.";
    const id = await insertReadDocument(owner, text, "invoice-4471.pdf", { status: "reading", text: null });
    await enqueueJob("read", id);
    const [job] = (await claimJobs("test-reader", ["read"], 50, 60)).filter((j) => j.document_id === id);
    const saved = await saveReading(job.id, "test-reader", { id, original_name: "invoice-4471.pdf", media_type: "application/pdf" }, { status: "ready", text, pageCount: 1, ocrUsed: false, ocrPages: 0, charCount: text.length, readMs: 3 }, { ssn: 0, routing: 0, card: 0 });
    expect(saved).not.toBe(false); // false: the job was no longer ours
    const row = await storedOf(id);
    expect(row.tokenizer_version).toBe(TOKENIZER_VERSION);
    expect(decodeTermCounts(row.counts)).toEqual(fresh(text, "invoice-4471.pdf"));
    expect(row.distinct_terms).toBe(fresh(text, "invoice-4471.pdf").size);
  });

  it("are made again by background jobs when the tokenizer's version changes", async () => {
    const ids = await insertFiledDocuments(owner, 2);
    await tokenizeDocuments(ids);
    // Rows as an older tokenizer left them (another version, other counts), and one with none.
    await owner("document_terms").whereIn("document_id", ids.slice(0, 5)).update({ tokenizer_version: TOKENIZER_VERSION + 1000, counts: '[["old",1]]' });
    await owner("document_terms").where({ document_id: ids[5] }).delete();
    const queued = await queueRetokenizing();
    expect(queued).toBeGreaterThanOrEqual(6);
    expect(await queueRetokenizing()).toBe(0); // jobs already queued: not twice
    expect(await runTokenizeJobs()).toBeGreaterThan(0);
    for (const id of ids.slice(0, 6)) {
      const row = await storedOf(id);
      const doc = await owner("documents").where({ id }).first("text", "original_name");
      expect(row.tokenizer_version).toBe(TOKENIZER_VERSION);
      expect(decodeTermCounts(row.counts)).toEqual(fresh(doc.text, doc.original_name));
    }
  });

  it("stream in batches into the same training set, and train the same model as the texts loaded whole", async () => {
    await tokenizeDocuments(await whereHumanFiled(owner("documents")).whereNotNull("text").pluck("id"));
    const small = await loadTrainingCounts(7);
    const large = await loadTrainingCounts(5_000);
    expect(small.documentIds).toEqual(large.documentIds);
    expect(small.labels).toEqual(large.labels);
    expect(small.tokenizedNow).toBe(0);
    // The reference: the same documents' texts, loaded whole and tokenised now.
    const texts = await owner("documents").whereIn("id", small.documentIds).orderBy("id").select("id", "text", "original_name", "media_type", "page_count", "ocr_used", "cabinet_type_id");
    const whole = await trainModel(texts.map((r) => ({ ...mlDocumentOf(r), label: String(r.cabinet_type_id) })), { threads: 1 });
    const streamed = await trainOnCounts(small.matrix, allRows(small.matrix.rows), small.labels, { threads: 1 });
    expect(streamed.terms).toEqual(whole.terms);
    // Tolerance 1e-9 on every weight (the same arithmetic in the same order: bit-identical in practice).
    let maxDiff = 0;
    streamed.weights.forEach((w, k) => (maxDiff = Math.max(maxDiff, Math.abs(w - whole.weights[k]))));
    expect(maxDiff).toBeLessThanOrEqual(1e-9);
  });

  it("let a retraining after a restart train without calling the tokenizer on any document", async () => {
    await tokenizeDocuments(await whereHumanFiled(owner("documents")).whereNotNull("text").pluck("id"));
    // A restart: nothing of the last run is cached in this process.
    forgetServingModel();
    seen.texts.length = 0;
    const r = await requestRetrain("manual", null);
    expect(r.status).toBe("queued");
    expect(await runTraining(r.versionId)).toBe(true);
    const v = await owner("model_versions").where({ id: r.versionId }).first();
    expect(v.status).toBe("current");
    expect(v.train_count).toBeGreaterThan(40);
    const documentTexts = new Set(await owner("documents").whereNotNull("text").pluck("text"));
    expect(seen.texts.filter((t) => documentTexts.has(t))).toEqual([]);
  });

  it("are tokenised during a retraining, once, for filed documents that have none yet", async () => {
    const ids = await insertFiledDocuments(owner, 1);
    await owner("document_terms").whereIn("document_id", ids).delete();
    seen.texts.length = 0;
    const set = await loadTrainingCounts();
    expect(set.tokenizedNow).toBe(ids.length);
    expect(seen.texts.length).toBe(ids.length);
    seen.texts.length = 0;
    expect((await loadTrainingCounts()).tokenizedNow).toBe(0);
    expect(seen.texts.length).toBe(0);
  });
});
