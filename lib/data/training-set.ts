import "server-only";
// The training labels: human-confirmed filings only (accepted, refiled, filed by hand, and
// auto-filed documents once a person confirmed them). Labels are cabinet type ids as strings.
import type { Knex } from "knex";
import { getDb } from "@/db";
import type { LabelledDocument } from "@/lib/ml";
import { findKindByMediaType } from "@/lib/intake";

export interface TrainingRow extends LabelledDocument {
  documentId: number;
}

/** Keeps filed documents (table `documents`, alias-free) that a person decided: the training labels. */
export function whereHumanFiled(q: Knex.QueryBuilder): Knex.QueryBuilder {
  return q
    .whereNotNull("filed_at")
    .whereNotNull("cabinet_type_id")
    .where((w) => w.whereIn("filed_how", ["accepted", "refiled", "by_hand"]).orWhere((a) => a.where("filed_how", "auto").whereNotNull("confirmed_at")));
}

interface LabelRow {
  id: number;
  text: string;
  original_name: string;
  media_type: string;
  page_count: number | null;
  ocr_used: number;
  cabinet_type_id: number;
}

export async function loadTrainingSet(): Promise<TrainingRow[]> {
  const rows: LabelRow[] = await whereHumanFiled(getDb()("documents"))
    .whereNotNull("text")
    .select("id", "text", "original_name", "media_type", "page_count", "ocr_used", "cabinet_type_id")
    .orderBy("id");
  return rows
    .filter((r) => /\p{L}/u.test(r.text))
    .map((r) => ({
      documentId: r.id,
      text: r.text,
      filename: r.original_name,
      meta: { kind: findKindByMediaType(r.media_type) ?? "other", pages: r.page_count ?? undefined, ocr: Boolean(r.ocr_used) },
      label: String(r.cabinet_type_id),
    }));
}
