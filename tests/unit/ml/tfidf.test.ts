import { describe, expect, it } from "vitest";
import { fitVocabulary, transformTokens } from "@/lib/ml/tfidf";
import { tokenizeDocument } from "@/lib/ml/tokenize";
import { runPythonReference } from "@/lib/ml/reference/export";
import { readCuad, requireSklearn } from "./helpers";

interface SkTfidf {
  sklearn: string;
  terms: string[];
  indptr: number[];
  indices: number[];
  data: number[];
}

describe("TF-IDF", () => {
  // 400 CUAD clauses (CC BY 4.0); scikit-learn's TfidfVectorizer from Debian's python3-sklearn.
  it("equals scikit-learn's TfidfVectorizer (sublinear tf, smooth idf, L2) on our tokens", () => {
    requireSklearn();
    const docs = readCuad("train").slice(0, 400).map((d) => tokenizeDocument(d));
    const vocab = fitVocabulary(docs, { minDf: 2, maxDf: 0.5, maxFeatures: 1_000_000 });
    const x = transformTokens(docs, vocab);
    const sk = runPythonReference<SkTfidf>("sklearn_tfidf.py", { docs, minDf: 2, maxDf: 0.5 });
    expect(vocab.terms).toEqual(sk.terms);
    expect(Array.from(x.indptr)).toEqual(sk.indptr);
    expect(Array.from(x.indices)).toEqual(sk.indices);
    let maxDiff = 0;
    sk.data.forEach((v, k) => (maxDiff = Math.max(maxDiff, Math.abs(v - x.data[k]))));
    expect(maxDiff).toBeLessThan(1e-12);
  });

  it("keeps rows at unit length and ignores unknown terms", () => {
    const vocab = fitVocabulary([["a", "b"], ["a", "c"], ["b", "c", "c"]], { minDf: 2, maxDf: 1, maxFeatures: 10 });
    const x = transformTokens([["a", "a", "zzz"], ["zzz"]], vocab);
    expect(x.indptr[1] - x.indptr[0]).toBe(1);
    expect(x.data[0]).toBeCloseTo(1, 15);
    expect(x.indptr[2] - x.indptr[1]).toBe(0);
  });

  it("applies min df, max df and the size cap (most frequent kept)", () => {
    const docs = [["a", "b", "b", "c"], ["a", "b"], ["a", "d"], ["a", "c"]];
    expect(fitVocabulary(docs, { minDf: 2, maxDf: 1, maxFeatures: 10 }).terms).toEqual(["a", "b", "c"]);
    expect(fitVocabulary(docs, { minDf: 2, maxDf: 0.75, maxFeatures: 10 }).terms).toEqual(["b", "c"]);
    expect(fitVocabulary(docs, { minDf: 1, maxDf: 1, maxFeatures: 2 }).terms).toEqual(["a", "b"]);
  });

  it("rejects bad options and empty input", () => {
    expect(() => fitVocabulary([], { minDf: 1, maxDf: 1, maxFeatures: 5 })).toThrow(/zero documents/);
    expect(() => fitVocabulary([["a"]], { minDf: 0, maxDf: 1, maxFeatures: 5 })).toThrow(/minDf/);
    expect(() => fitVocabulary([["a"]], { minDf: 1, maxDf: Number.NaN, maxFeatures: 5 })).toThrow(/maxDf/);
  });
});
