import "server-only";
// The retention date and the legal-hold test as SQL, for lists that filter and page in the
// database (Cabinets' "past due", the disposal due list). They mirror lib/records/retention-date.ts
// (the date shown) and tests/integration/retention.test.ts checks that the two agree, 29 February
// included. Aliases are names from our own code, never user input.

/** The retention date of document `d` (cabinet type `c`, matter `m` joined), or NULL. */
export function dueOnSql(d = "d", c = "c", m = "m"): string {
  return `(CASE
    WHEN ${d}.filed_at IS NULL OR ${c}.id IS NULL OR ${c}.retention_years IS NULL THEN NULL
    WHEN ${c}.retention_trigger = 'after_filing' THEN DATE_ADD(DATE(${d}.filed_at), INTERVAL ${c}.retention_years YEAR)
    WHEN ${c}.retention_trigger = 'after_matter_close' AND ${m}.status = 'closed' AND ${m}.closed_on IS NOT NULL
      THEN DATE_ADD(${m}.closed_on, INTERVAL ${c}.retention_years YEAR)
    ELSE NULL END)`;
}

/**
 * True while a hold stops document `d` from being destroyed: a hold on the document itself, on
 * the matter it is filed in, or on any matter it was ever linked to (document_matter_links). The
 * last is deliberately wide: a document once filed or suggested into a held matter may matter to
 * the case, and keeping a record too long is the safer mistake.
 */
export function heldSql(d = "d"): string {
  return `EXISTS (SELECT 1 FROM legal_holds lh WHERE lh.released_at IS NULL AND (
      lh.document_id = ${d}.id
      OR lh.matter_id = ${d}.matter_id
      OR lh.matter_id IN (SELECT lhl.matter_id FROM document_matter_links lhl WHERE lhl.document_id = ${d}.id)))`;
}
