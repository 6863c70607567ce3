import { describe, expect, it } from "vitest";
import { bucketPages, tokenizeDocument, DEFAULT_TOKENIZE_OPTIONS } from "@/lib/ml/tokenize";

// Expected stems are the Porter stemmer's (M. F. Porter, "An algorithm for suffix stripping", 1980)
// as wink-eng-lite-web-model 1.8.1 implements it.
describe("tokenizeDocument", () => {
  const plain = { ...DEFAULT_TOKENIZE_OPTIONS, bigrams: false };

  it("lower-cases, stems and keeps only words with letters", () => {
    const tokens = tokenizeDocument({ text: "RUNNING Companies paid $500 on 3:30 2024" }, plain);
    expect(tokens).toEqual(["run", "compani", "paid"]);
  });

  it("drops stop words from unigrams but keeps negations", () => {
    const tokens = tokenizeDocument({ text: "the licensee shall not assign" }, plain);
    expect(tokens).not.toContain("the");
    expect(tokens).toContain("not");
    expect(tokens).toContain("assign");
  });

  it("forms bigrams over neighbouring words, stop words included by default", () => {
    const tokens = tokenizeDocument({ text: "may not assign" });
    expect(tokens).toContain("not assign");
    expect(tokens).toContain("may not");
    const noStops = tokenizeDocument({ text: "may not assign" }, { ...DEFAULT_TOKENIZE_OPTIONS, stopWordsInBigrams: false });
    expect(noStops).not.toContain("may not");
  });

  it("adds prefixed filename and metadata tokens", () => {
    const tokens = tokenizeDocument({ text: "", filename: "Bank_statement-2024.pdf", meta: { kind: "PDF", pages: 7, ocr: true } });
    expect(tokens).toEqual(["file:bank", "file:statement", "meta:kind=pdf", "meta:pages=4-10", "meta:ocr=yes"]);
  });

  it("buckets page counts", () => {
    expect([1, 2, 3, 4, 10, 11].map(bucketPages)).toEqual(["1", "2-3", "2-3", "4-10", "4-10", "11+"]);
  });

  it("gives nothing for empty text", () => {
    expect(tokenizeDocument({ text: "" })).toEqual([]);
  });
});
