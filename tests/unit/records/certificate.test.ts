import { parse } from "csv-parse/sync";
import { PDFParse } from "pdf-parse";
import { describe, expect, it } from "vitest";
import { certificateCsv, CSV_COLUMNS } from "@/lib/records/certificate-csv";
import { certificatePdf } from "@/lib/records/certificate-pdf";
import type { Certificate, CertificateItem } from "@/lib/records/certificate-types";
import { RETENTION_CAUTION } from "@/lib/retention";

// The certificate's two forms, read back with independent parsers (csv-parse, pdf-parse).
const item = (documentId: number, name: string, outcome = "disposed"): CertificateItem => ({
  documentId,
  name,
  sha256: "9f86d081884c7d659a2feaa0c55ad015a3bf4f1b2b0b822cd15d6c15b0f00a08", // the SHA-256 of "test", as a sample
  matter: "AQ-2026-0101",
  cabinetType: "Invoices & receipts",
  uploadedAt: "2017-01-15T10:00:00.000Z",
  filedAt: "2017-01-15T10:30:00.000Z",
  dueOn: "2024-01-15",
  rule: "7 years after filing",
  ruleSource: "Common practice.",
  outcome,
  disposedAt: outcome === "disposed" ? "2026-12-02T09:00:00.000Z" : null,
  objectDeletedAt: outcome === "disposed" ? "2026-12-02T09:00:01.000Z" : null,
});

const cert: Certificate = {
  batchId: 7,
  note: "Invoices past seven years",
  proposedBy: "Greta Lindqvist",
  proposedAt: "2026-11-30T08:00:00.000Z",
  approvedBy: "Oluwaseun Hartley",
  approvedAt: "2026-12-02T09:00:00.000Z",
  destroyed: [item(11, "Ångström & Søn — Жук invoice.pdf"), item(12, "=HYPERLINK(\"x\").pdf")],
  kept: [item(13, "held-statement.pdf", "kept_hold")],
  caution: RETENTION_CAUTION,
};

describe("certificate of disposal", () => {
  it("CSV: one row per destroyed document, formulas defused, the caution at the end", () => {
    const csv = certificateCsv(cert);
    const rows = parse(csv, { columns: true, comment: "#" }) as Record<string, string>[];
    expect(Object.keys(rows[0])).toEqual(CSV_COLUMNS);
    expect(rows.map((r) => r.document_id)).toEqual(["11", "12"]);
    expect(rows[0]).toMatchObject({ name: "Ångström & Søn — Жук invoice.pdf", retention_rule: "7 years after filing", retention_date: "2024-01-15", approved_by: "Oluwaseun Hartley", proposed_by: "Greta Lindqvist" });
    // OWASP "CSV Injection": a cell starting with = + - @ is prefixed so a spreadsheet shows it as text.
    expect(rows[1].name).toBe("'=HYPERLINK(\"x\").pdf");
    expect(csv).not.toContain("held-statement.pdf");
    expect(csv.trimEnd().split("\r\n").at(-1)).toBe(`# ${RETENTION_CAUTION}`);
  });

  it("PDF: names print as stored (Latin and Cyrillic), kept documents apart, the caution present", async () => {
    const pdf = await certificatePdf(cert, new Date("2026-12-02T09:00:00Z"));
    const parser = new PDFParse({ data: new Uint8Array(pdf) });
    const text = (await parser.getText()).text.replace(/\s+/g, " ");
    await parser.destroy();
    expect(text).toContain("Certificate of disposal");
    expect(text).toContain("Ångström & Søn — Жук invoice.pdf");
    expect(text).toContain("Approved by Oluwaseun Hartley");
    expect(text).toContain(RETENTION_CAUTION);
    const [destroyed, kept] = text.split("Documents kept (not destroyed)");
    expect(destroyed).not.toContain("held-statement.pdf");
    expect(kept).toContain("held-statement.pdf — legal hold");
  });
});
