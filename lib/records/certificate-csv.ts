// The certificate of disposal as CSV: one row per destroyed document, then the caution.
import { stringify } from "csv-stringify/sync";
import type { Certificate } from "./certificate-types";

export const CSV_COLUMNS = [
  "batch", "document_id", "name", "sha256", "cabinet_type", "matter", "uploaded_at", "filed_at", "retention_rule", "rule_source",
  "retention_date", "destroyed_at", "original_removed_at", "proposed_by", "proposed_at", "approved_by", "approved_at",
];

/** A cell starting with = + - @ is read as a formula by spreadsheets (OWASP "CSV injection"): quote it as text. */
const guard = (v: string | null) => (v && /^[=+\-@\t\r]/.test(v) ? `'${v}` : (v ?? ""));

export function certificateCsv(c: Certificate): string {
  const rows = c.destroyed.map((i) =>
    [c.batchId, i.documentId, i.name, i.sha256, i.cabinetType, i.matter, i.uploadedAt, i.filedAt, i.rule, i.ruleSource, i.dueOn, i.disposedAt, i.objectDeletedAt, c.proposedBy, c.proposedAt, c.approvedBy, c.approvedAt].map((v) =>
      guard(v === null || v === undefined ? null : String(v)),
    ),
  );
  const body = stringify([CSV_COLUMNS, ...rows], { record_delimiter: "windows" });
  return `${body}${stringify([[`# ${c.caution}`]], { record_delimiter: "windows" })}`;
}
