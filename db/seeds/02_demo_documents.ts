// Demo documents: a few hundred invented letters, invoices, statements, notices, contracts …
// made as real PDF and Word files, kept in the bucket, read with the real readers, and filed by
// the demo people over the past weeks; a handful more wait in To review. Only seeds an office
// with no documents yet (so it can run twice), and only when SEED_DEMO_DOCUMENTS is on.
import crypto from "node:crypto";
import type { Knex } from "knex";
import { env } from "../../lib/env";
import { generateDemoDocuments } from "../../lib/demo/documents";
import { readDocument, countSensitive } from "../../lib/intake";
import { putObject } from "../../storage/s3";
import { appendFilingEvent } from "../../lib/data/record";
import { demoFilingTime, demoUploadTime } from "../../lib/demo/timeline";

const FILED = 300;
const WAITING = 12;
const MEDIA = { pdf: "application/pdf", docx: "application/vnd.openxmlformats-officedocument.wordprocessingml.document" } as const;

export async function seed(knex: Knex): Promise<void> {
  if (!env.seedDemoDocuments) return;
  const [{ n }] = await knex("documents").count({ n: "*" });
  if (Number(n) > 0) return;

  const types = new Map((await knex("cabinet_types").select("id", "name")).map((t) => [t.name, t.id]));
  const matters = new Map((await knex("matters").select("id", "number")).map((m) => [m.number, m.id]));
  const people = await knex("users").whereIn("email", ["clerk@example.com", "partner@example.com"]).select("id", "email");
  const clerk = people.find((p) => p.email === "clerk@example.com")!.id;
  const partner = people.find((p) => p.email === "partner@example.com")!.id;
  const docs = await generateDemoDocuments({ count: FILED + WAITING, seed: 20261201 });

  const now = Date.now();
  for (const [i, d] of docs.entries()) {
    const sha256 = crypto.createHash("sha256").update(d.bytes).digest("hex");
    const key = `originals/demo/${sha256}`;
    const mediaType = MEDIA[d.kind];
    await putObject(key, Buffer.from(d.bytes), { contentType: mediaType, metadata: { sha256, "original-name": encodeURIComponent(d.fileName) } });
    const read = await readDocument(d.bytes, mediaType);
    const filed = i < FILED;
    const matterId = matters.get(d.matterNumber)!;
    // The restricted matter's papers are filed by its team (the partner), others mostly by the clerk.
    const filer = d.matterNumber === "AQ-2026-0131" || i % 5 === 0 ? partner : clerk;
    const at = demoUploadTime(i, docs.length, now);
    const [id] = await knex("documents").insert({
      sha256,
      original_name: d.fileName,
      media_type: mediaType,
      size_bytes: d.bytes.byteLength,
      storage_key: key,
      status: read.status,
      unreadable_code: read.status === "unreadable" ? read.code : null,
      unreadable_reason: read.status === "unreadable" ? read.reason : null,
      text: read.status === "ready" ? read.text : null,
      page_count: read.status === "ready" ? read.pageCount : null,
      char_count: read.status === "ready" ? read.charCount : null,
      read_ms: read.status === "ready" ? read.readMs : null,
      ...(read.status === "ready" ? (({ ssn, routing, card }) => ({ ssn_count: ssn, routing_count: routing, card_count: card }))(countSensitive(read.text)) : {}),
      uploaded_by: clerk,
      uploaded_at: at,
      read_at: at,
      ...(filed
        ? { cabinet_type_id: types.get(d.cabinetTypeName), matter_id: matterId, filed_by: filer, filed_at: demoFilingTime(at, now), filed_how: "by_hand" }
        : {}),
    });
    if (filed) {
      await appendFilingEvent(knex, {
        documentId: id,
        userId: filer,
        action: "filed_by_hand",
        toCabinetTypeId: types.get(d.cabinetTypeName),
        toMatterId: matterId,
        reason: "Filed before Foldwright suggested anything (demo history).",
        createdAt: demoFilingTime(at, now),
      });
    }
    // Waiting documents get their suggestions once the first model exists (the start command
    // queues them after training; see queueMissingSuggestions).
  }
}
