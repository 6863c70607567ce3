import { S3Client } from "@aws-sdk/client-s3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { requestRetrain, runTraining } from "@/lib/learning/retrain";
import { forgetServingModel, getServingModel } from "@/lib/learning/model-store";
import { promoteModelVersion } from "@/lib/data/models";
import { findDocumentForSuggestion, saveSuggestion } from "@/lib/data/suggestions";
import { computeSuggestion } from "@/lib/learning/suggest";
import { headObject } from "@/storage/s3";
import { ownerDb } from "../helpers/db";
import { insertFiledDocuments, insertReadDocument, insertUnfiledDocument, TRAINING_TYPES } from "../helpers/filed-documents";

// Retraining end to end against the real MariaDB and S3 fake: train, evaluate, promote; refuse
// a worse candidate; one run at a time; a failed run leaves the current model serving; rollback.
const owner = ownerDb();
const g = globalThis as unknown as { foldwrightS3?: S3Client };

async function newVersion(): Promise<number> {
  const r = await requestRetrain("manual", null);
  if (r.status !== "queued") throw new Error(`expected a queued run, got ${JSON.stringify(r)}`);
  return r.versionId;
}
const version = (id: number) => owner("model_versions").where({ id }).first();
const currentId = async () => (await owner("model_versions").where({ status: "current" }).first("id"))?.id;

/** Shuffles labels with a fixed seed: a deliberately worse candidate. */
function shuffled(labels: string[]): string[] {
  const out = [...labels];
  let seed = 7;
  for (let i = out.length - 1; i > 0; i--) {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    const j = seed % (i + 1);
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}

beforeAll(async () => {
  await owner("model_versions").update({ status: "retired" });
  await insertFiledDocuments(owner, 15);
  forgetServingModel();
});
afterAll(async () => {
  await owner("jobs").where({ kind: "train" }).delete();
  await owner.destroy();
  await closeDb();
});

describe("retraining", () => {
  it("trains on human filings, cross-validates, stores the artifact and promotes the first model", async () => {
    const id = await newVersion();
    expect(await runTraining(id)).toBe(true);
    const v = await version(id);
    expect(v).toMatchObject({ status: "current", trigger: "manual" });
    expect(Number(v.macro_f1)).toBeGreaterThan(0.8);
    expect(v.train_count).toBeGreaterThanOrEqual(TRAINING_TYPES.length * 15);
    expect(typeof v.class_list === "string" ? JSON.parse(v.class_list) : v.class_list).toHaveLength(TRAINING_TYPES.length);
    expect((await headObject(v.artifact_key))?.size).toBe(v.artifact_bytes);
    expect((await getServingModel())?.versionId).toBe(id);
  });

  it("does not promote a candidate trained on shuffled labels, and says why", async () => {
    const before = await currentId();
    const id = await newVersion();
    await runTraining(id, { transformLabels: shuffled });
    const v = await version(id);
    expect(v.status).toBe("rejected");
    expect(Number(v.macro_f1)).toBeLessThan(Number(v.compared_macro_f1) - 0.01);
    expect(v.reason).toMatch(/^Not promoted: macro-F1 .* more than one point below .* The current model keeps serving\.$/);
    expect(await currentId()).toBe(before);
  });

  it("starts one run when two requests arrive together, and trains once when two workers try", async () => {
    const [a, b] = await Promise.all([requestRetrain("manual", null), requestRetrain("nightly", null)]);
    expect([a.status, b.status].sort()).toEqual(["busy", "queued"]);
    expect(a.versionId).toBe(b.versionId);
    const [first, second] = await Promise.all([runTraining(a.versionId), runTraining(a.versionId)]);
    expect([first, second].sort()).toEqual([false, true]);
    expect((await version(a.versionId)).status).toMatch(/^(current|rejected)$/);
  });

  it("leaves the current model serving when a run fails midway (storage gone while storing the model)", async () => {
    const before = await currentId();
    const real = g.foldwrightS3;
    g.foldwrightS3 = new S3Client({ endpoint: "http://127.0.0.1:9", region: "us-east-1", forcePathStyle: true, credentials: { accessKeyId: "x", secretAccessKey: "x" }, maxAttempts: 1 });
    try {
      const id = await newVersion();
      await runTraining(id);
      const v = await version(id);
      expect(v.status).toBe("failed");
      expect(v.reason).toMatch(/^Training failed: .*The current model keeps serving\.$/);
    } finally {
      g.foldwrightS3 = real;
    }
    expect(await currentId()).toBe(before);
    expect((await getServingModel())?.versionId).toBe(before);
  });

  it("rolls back to an earlier version and serves it", async () => {
    const first = (await owner("model_versions").whereIn("status", ["current", "retired"]).whereNotNull("artifact_key").orderBy("id").first("id")).id;
    const id = await newVersion();
    await runTraining(id);
    expect(await currentId()).toBe(id);
    await promoteModelVersion(first, null, "Rolled back by the test.");
    expect(await currentId()).toBe(first);
    expect((await version(id)).status).toBe("retired");
    expect((await getServingModel())?.versionId).toBe(first);
  });

  it("auto-files exactly the documents above the cross-validated bar, and none below", async () => {
    const current = await version(await currentId());
    expect(current.autofile_threshold).not.toBeNull();
    const bar = Number(current.autofile_threshold);
    await owner("office_settings").where({ id: 1 }).update({ auto_file_enabled: true, min_examples_per_type: 5 });
    try {
      const docs: number[] = [];
      for (const type of TRAINING_TYPES) docs.push(await insertUnfiledDocument(owner, type, "For matter AQ-2026-0101."));
      // Mixed wording: the model should be unsure of these.
      docs.push(await insertUnfiledDocument(owner, "Payroll records", "invoice statement period lease gross pay agreement amount due. Matter AQ-2026-0101."));
      docs.push(await insertUnfiledDocument(owner, "Bank & card statements", "lease invoice payroll deposits landlord. Matter AQ-2026-0101."));
      // Nothing the model learned: its confidence must stay below the bar.
      const unrelated = await insertReadDocument(owner, "Garden committee notes: tulips, benches, compost and the spring planting rota. Matter AQ-2026-0101.", "garden-notes.pdf");
      docs.push(unrelated);
      for (const id of docs) {
        const doc = await findDocumentForSuggestion(id);
        await saveSuggestion(null, null, await computeSuggestion(doc!));
      }
      const rows = await owner("documents as d")
        .join("suggestions as s", "s.document_id", "d.id")
        .whereIn("d.id", docs)
        .select("d.id", "d.filed_how", "s.model_confidence", "s.no_confident_match", "s.top_matter_id", "s.matter_ambiguous");
      const expected = rows.map((r) => r.model_confidence !== null && Number(r.model_confidence) >= bar && !r.no_confident_match && r.top_matter_id !== null && !r.matter_ambiguous);
      expect(rows.map((r) => r.filed_how === "auto")).toEqual(expected);
      expect(expected.some(Boolean)).toBe(true);
      const garden = rows.find((r) => r.id === unrelated)!;
      expect(Number(garden.model_confidence)).toBeLessThan(bar);
      expect(garden.filed_how).toBeNull();
      const auto = rows.filter((r) => r.filed_how === "auto").map((r) => r.id);
      expect(await owner("filing_events").whereIn("document_id", auto).where({ action: "auto_filed" }).count({ n: "*" })).toEqual([{ n: auto.length }]);
    } finally {
      await owner("office_settings").where({ id: 1 }).update({ auto_file_enabled: false });
    }
  });
});

describe("an abandoned run", () => {
  it("does not block retraining forever: after an hour without a live job it is marked failed", async () => {
    const [stale] = await owner("model_versions").insert({ trigger: "start", status: "training", created_at: owner.raw("NOW(3) - INTERVAL 2 HOUR") });
    const r = await requestRetrain("manual", null);
    expect(r.status).toBe("queued");
    expect(await version(stale)).toMatchObject({ status: "failed", reason: expect.stringMatching(/stopped before finishing/) });
    await owner("model_versions").where({ id: r.versionId }).update({ status: "failed" });
  });
});
