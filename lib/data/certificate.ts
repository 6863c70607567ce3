import "server-only";
// What a certificate of disposal says: one executed batch, exactly the documents it destroyed,
// when, under which rule, by whose decision (and, apart, any it kept because of a hold).
import { getBatch, type BatchDetail } from "@/lib/data/disposal-batches";
import type { CurrentUser } from "@/lib/data/users";
import { AppError } from "@/lib/errors";
import type { Certificate } from "@/lib/records/certificate-types";
import { RETENTION_CAUTION } from "@/lib/retention";

export function toCertificate(batch: BatchDetail): Certificate {
  if (batch.status !== "approved" || !batch.decidedBy || !batch.decidedAt) {
    throw new AppError(409, "not_executed", `Batch #${batch.id} is ${batch.status}; a certificate of disposal exists only once a batch is approved and carried out.`);
  }
  return {
    batchId: batch.id,
    note: batch.note,
    proposedBy: batch.proposedBy,
    proposedAt: batch.proposedAt,
    approvedBy: batch.decidedBy,
    approvedAt: batch.decidedAt,
    destroyed: batch.items.filter((i) => i.outcome === "disposed"),
    kept: batch.items.filter((i) => i.outcome === "kept_hold" || i.outcome === "kept_not_due"),
    caution: RETENTION_CAUTION,
  };
}

export async function getCertificate(user: CurrentUser, batchId: number): Promise<Certificate> {
  return toCertificate(await getBatch(user, batchId)); // the wall: 403 for a batch with documents the user may not see
}
