import { describe, expect, it } from "vitest";
import { runPythonReference } from "@/lib/ml/reference/export";
import { trainModel, trainOnCounts, predictCounts, predictDocuments } from "@/lib/ml/model";
import {
  allRows,
  countMatrixOf,
  countTerms,
  CountMatrixBuilder,
  decodeTermCounts,
  encodeTermCounts,
  fitCountVocabulary,
  transformCountRows,
} from "@/lib/ml/term-counts";
import { tokenizeDocument } from "@/lib/ml/tokenize";
import { fitVocabulary, transformTokens } from "@/lib/ml/tfidf";
import { trainOneVsRest } from "@/lib/ml/one-vs-rest";
import { mostFrequentLabels, readCuad, requireSklearn, sliceCuad } from "./helpers";

interface SkTfidf {
  sklearn: string;
  terms: string[];
  indptr: number[];
  indices: number[];
  data: number[];
}

describe("term counts", () => {
  // 400 CUAD clauses (The Atticus Project, CC BY 4.0).
  const docs = readCuad("train").slice(0, 400);

  it("stored and read back equal a fresh tokenisation of the document", () => {
    for (const d of docs.slice(0, 50)) {
      const fresh = new Map<string, number>();
      for (const t of tokenizeDocument(d)) fresh.set(t, (fresh.get(t) ?? 0) + 1);
      const stored = decodeTermCounts(encodeTermCounts(countTerms(d)));
      expect(stored).toEqual(fresh);
    }
    // A term that looks like an object key is kept as a term.
    expect(decodeTermCounts(encodeTermCounts(new Map([["__proto__", 2]])))).toEqual(new Map([["__proto__", 2]]));
  });

  it("refuse stored counts that are not [term, count] pairs, saying what to do", () => {
    expect(() => decodeTermCounts('{"a":1}')).toThrow(/re-tokenise/);
    expect(() => decodeTermCounts('[["a",0]]')).toThrow(/re-tokenise/);
  });

  // scikit-learn's TfidfVectorizer (Debian's python3-sklearn) on the same tokens, as tfidf.test.ts
  // checks the token path: the counts path must give the same vocabulary and the same rows.
  it("give scikit-learn's TF-IDF rows when fitted from a CountMatrix", () => {
    requireSklearn();
    const tokens = docs.map((d) => tokenizeDocument(d));
    const m = countMatrixOf(docs);
    const { vocabulary, columnOf } = fitCountVocabulary(m, allRows(m.rows), { minDf: 2, maxDf: 0.5, maxFeatures: 1_000_000 });
    const x = transformCountRows(m, allRows(m.rows), columnOf, vocabulary);
    const sk = runPythonReference<SkTfidf>("sklearn_tfidf.py", { docs: tokens, minDf: 2, maxDf: 0.5 });
    expect(vocabulary.terms).toEqual(sk.terms);
    expect(Array.from(x.indptr)).toEqual(sk.indptr);
    expect(Array.from(x.indices)).toEqual(sk.indices);
    let maxDiff = 0;
    sk.data.forEach((v, k) => (maxDiff = Math.max(maxDiff, Math.abs(v - x.data[k]))));
    expect(maxDiff).toBeLessThan(1e-12);
  });

  it("train, from stored counts streamed in batches, the same model as from the whole set of texts", async () => {
    const all = readCuad("train");
    const train = sliceCuad(all, mostFrequentLabels(all, 6), 60);
    const whole = await trainModel(train, { threads: 1 });
    // The reference: the token path of tfidf.ts (checked against scikit-learn in tfidf.test.ts)
    // on the whole set at once, into the same one-vs-rest solver.
    const tokens = train.map((d) => tokenizeDocument(d, whole.options.tokenize));
    const vocab = fitVocabulary(tokens, whole.options.tfidf);
    const classes = [...new Set(train.map((d) => d.label))].sort();
    const reference = await trainOneVsRest(transformTokens(tokens, vocab), Int32Array.from(train, (d) => classes.indexOf(d.label)), classes.length, whole.options);
    // As the retraining reads them: stored JSON, decoded a batch of 37 at a time into one builder.
    const stored = train.map((d) => encodeTermCounts(countTerms(d)));
    const builder = new CountMatrixBuilder();
    for (let i = 0; i < stored.length; i += 37) for (const s of stored.slice(i, i + 37)) builder.add(decodeTermCounts(s));
    const m = builder.build();
    const streamed = await trainOnCounts(m, allRows(m.rows), train.map((d) => d.label), { threads: 1 });
    expect(streamed.classes).toEqual(classes);
    expect(streamed.terms).toEqual(vocab.terms);
    // Tolerance: 1e-9 on every weight and intercept (the two paths do the same arithmetic in
    // the same order, so in practice they are bit-identical).
    let maxDiff = 0;
    const referenceWeights = Float32Array.from(reference.weights);
    streamed.weights.forEach((w, k) => (maxDiff = Math.max(maxDiff, Math.abs(w - referenceWeights[k]))));
    streamed.intercepts.forEach((b, k) => (maxDiff = Math.max(maxDiff, Math.abs(b - reference.intercepts[k]))));
    expect(maxDiff).toBeLessThanOrEqual(1e-9);
    // Predicting from stored counts equals predicting from the text.
    const test = sliceCuad(readCuad("test"), whole.classes, 5);
    const fromText = predictDocuments(whole, test);
    const fromCounts = predictCounts(whole, test.map((d) => countTerms(d)));
    fromText.forEach((p, i) => {
      expect(fromCounts[i].label).toBe(p.label);
      expect(fromCounts[i].confidence).toBeCloseTo(p.confidence, 12);
    });
  }, 120_000);
});
