import { describe, expect, it } from "vitest";
import { cleanFileName } from "@/lib/intake/clean-file-name";

describe("cleanFileName", () => {
  it("keeps only the last part of a Unix or Windows path", () => {
    expect(cleanFileName("../../etc/passwd")).toBe("passwd");
    expect(cleanFileName("C:\\Users\\clerk\\Desktop\\Fee letter.pdf")).toBe("Fee letter.pdf");
    expect(cleanFileName("scans/2026\\march/lease.pdf")).toBe("lease.pdf");
  });

  it("removes control characters and bidi overrides that could disguise an extension", () => {
    expect(cleanFileName("inv\u0000oice\u0007.pdf")).toBe("invoice.pdf");
    // U+202E (right-to-left override) makes "invoice\u202Efdp.exe" display as "invoiceexe.pdf".
    expect(cleanFileName("invoice\u202Efdp.exe")).toBe("invoicefdp.exe");
  });

  it("trims spaces and leading dots and squeezes runs of whitespace", () => {
    expect(cleanFileName("   ..hidden   bank\tstatement.pdf  ")).toBe("hidden bank statement.pdf");
  });

  it("caps a 300-character name with separators and controls at 200 characters, keeping .pdf", () => {
    const long = `folder/sub\\${"a".repeat(150)}\u0001${"b".repeat(146)}.pdf`;
    expect(long.length).toBeGreaterThanOrEqual(300);
    const cleaned = cleanFileName(long);
    expect(cleaned).toHaveLength(200);
    expect(cleaned).toBe(`${"a".repeat(150)}${"b".repeat(46)}.pdf`);
  });

  it("cuts by characters, never through an emoji's surrogate pair", () => {
    const cleaned = cleanFileName(`${"📄".repeat(250)}.docx`);
    expect(Array.from(cleaned)).toHaveLength(200);
    expect(cleaned.endsWith("📄.docx")).toBe(true);
  });

  it("falls back to 'document' when nothing usable is left", () => {
    for (const name of ["", "   ", "/", "..\\..\\", "\u0000\u0001", "...", "folder/"]) {
      expect(cleanFileName(name)).toBe("document");
    }
  });
});
