// Term counts: a document tokenised once, kept, and turned into TF-IDF rows without its text.
//
// The app stores each read document's counts (`countTerms`, `encodeTermCounts`) with the
// TOKENIZER_VERSION that made them; a retraining streams them back into a CountMatrix (raw counts
// over one dictionary of every term seen) and fits the vocabulary and the TF-IDF rows from it, so
// the text is never tokenised again. Memory is the dictionary plus one (term id, count) pair per
// distinct term of each document: it grows with the vocabulary and the training matrix, not with
// the documents' text. The definitions are tfidf.ts's (scikit-learn's TfidfVectorizer, sublinear
// tf, smooth idf, L2 rows) computed in the same order, so a model trained from stored counts has
// bit-identical weights to one trained from the texts (tests/unit/ml/term-counts.test.ts).
//
// A new feature block (say a heading block) that tokenises into the same token list with a
// prefix of its own (like `file:` and `meta:`) is stored with no change here; a block that needs
// its own idf or weight can split the counts by that prefix. Either way TOKENIZER_VERSION goes up,
// and the app re-tokenises stored documents in the background.
import type { CsrMatrix } from "./csr";
import { buildPriorDocuments, MODEL_TOKENIZE_OPTIONS, type TypePrior } from "./model-features";
import { DEFAULT_TFIDF_OPTIONS, headingColumns, indexTerms, weighHeadingBlock, type TfidfOptions, type TfidfVocabulary } from "./tfidf";
import { DEFAULT_TOKENIZE_OPTIONS, HEADING_PREFIX, tokenizeDocument, type TokenizeOptions } from "./tokenize";
import type { MlDocument } from "./types";
import { checkDocument } from "./validate";

/** Term → how often it occurs in one document. */
export type TermCounts = Map<string, number>;

/** Counts one document's feature tokens (the stored form of a read document: the product's tokenizer options, heading block included). */
export function countTerms(doc: MlDocument, options: TokenizeOptions = MODEL_TOKENIZE_OPTIONS): TermCounts {
  checkDocument(doc, "The document");
  return countTokenList(tokenizeDocument(doc, options));
}

/** Counts a token list. */
export function countTokenList(tokens: string[]): TermCounts {
  const counts: TermCounts = new Map();
  for (const t of tokens) counts.set(t, (counts.get(t) ?? 0) + 1);
  return counts;
}

/** Stored form: a JSON array of [term, count] pairs (no object keys, so any term is safe). */
export function encodeTermCounts(counts: TermCounts): string {
  return JSON.stringify([...counts]);
}

export function decodeTermCounts(stored: string): TermCounts {
  const pairs = JSON.parse(stored) as unknown;
  if (!Array.isArray(pairs)) throw new Error("Stored term counts are not a list of [term, count] pairs; re-tokenise the document.");
  const counts: TermCounts = new Map();
  for (const p of pairs) {
    if (!Array.isArray(p) || typeof p[0] !== "string" || !Number.isInteger(p[1]) || p[1] < 1) {
      throw new Error("Stored term counts hold a pair that is not [term, whole count ≥ 1]; re-tokenise the document.");
    }
    counts.set(p[0], p[1]);
  }
  return counts;
}

/** Raw counts of many documents over one dictionary: row i holds ids/counts[indptr[i]..indptr[i+1]). */
export interface CountMatrix {
  rows: number;
  /** Every term seen, in the order first seen (not a vocabulary: nothing is cut yet). */
  terms: string[];
  indptr: Int32Array;
  ids: Int32Array;
  counts: Int32Array;
}

/** Builds a CountMatrix a document (or a streamed batch) at a time. */
export class CountMatrixBuilder {
  private readonly terms: string[] = [];
  private readonly index = new Map<string, number>();
  private ids = new Int32Array(1 << 16);
  private counts = new Int32Array(1 << 16);
  private indptr = new Int32Array(1 << 10);
  private nnz = 0;
  private rows = 0;

  get size(): number {
    return this.rows;
  }

  /** Appends one document's counts as the next row. */
  add(counts: Iterable<[string, number]>): void {
    for (const [term, c] of counts) {
      let id = this.index.get(term);
      if (id === undefined) {
        id = this.terms.length;
        this.terms.push(term);
        this.index.set(term, id);
      }
      if (this.nnz === this.ids.length) {
        this.ids = grow(this.ids);
        this.counts = grow(this.counts);
      }
      this.ids[this.nnz] = id;
      this.counts[this.nnz] = c;
      this.nnz++;
    }
    if (this.rows + 2 > this.indptr.length) this.indptr = grow(this.indptr);
    this.rows++;
    this.indptr[this.rows] = this.nnz;
  }

  build(): CountMatrix {
    return {
      rows: this.rows,
      terms: this.terms,
      indptr: this.indptr.slice(0, this.rows + 1),
      ids: this.ids.slice(0, this.nnz),
      counts: this.counts.slice(0, this.nnz),
    };
  }
}

function grow(a: Int32Array<ArrayBuffer>): Int32Array<ArrayBuffer> {
  const b = new Int32Array(a.length * 2);
  b.set(a);
  return b;
}

/** A CountMatrix of documents tokenised now (the command line, tests, and the texts path). */
export function countMatrixOf(docs: MlDocument[], options: TokenizeOptions = DEFAULT_TOKENIZE_OPTIONS): CountMatrix {
  const builder = new CountMatrixBuilder();
  docs.forEach((d, i) => {
    checkDocument(d, `Document ${i + 1}`);
    builder.add(countTokenList(tokenizeDocument(d, options)));
  });
  return builder.build();
}

/** A vocabulary fitted on some rows of a CountMatrix, with the dictionary id → column map. */
export interface CountVocabulary {
  vocabulary: TfidfVocabulary;
  /** column of each dictionary id, or -1 when the term is not in the vocabulary. */
  columnOf: Int32Array;
}

const compareTerms = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** fitVocabulary (tfidf.ts) on the given rows of a CountMatrix: same limits, same idf. */
export function fitCountVocabulary(m: CountMatrix, rowIds: ArrayLike<number>, options: TfidfOptions = DEFAULT_TFIDF_OPTIONS): CountVocabulary {
  const n = rowIds.length;
  if (n === 0) throw new Error("Cannot fit a vocabulary on zero documents.");
  const df = new Int32Array(m.terms.length);
  const total = new Float64Array(m.terms.length);
  for (let r = 0; r < n; r++) {
    const row = rowIds[r];
    for (let k = m.indptr[row]; k < m.indptr[row + 1]; k++) {
      df[m.ids[k]]++;
      total[m.ids[k]] += m.counts[k];
    }
  }
  const maxDocs = Math.floor(options.maxDf * n + 1e-9);
  let kept: number[] = [];
  const headingMinDf = options.headingMinDf ?? options.minDf;
  for (let id = 0; id < df.length; id++) {
    if (df[id] >= (m.terms[id].startsWith(HEADING_PREFIX) ? headingMinDf : options.minDf) && df[id] <= maxDocs) kept.push(id);
  }
  if (kept.length > options.maxFeatures) {
    kept.sort((a, b) => total[b] - total[a] || compareTerms(m.terms[a], m.terms[b]));
    kept = kept.slice(0, options.maxFeatures);
  }
  kept.sort((a, b) => compareTerms(m.terms[a], m.terms[b]));
  if (kept.length === 0) {
    throw new Error("No term passed the vocabulary limits (minDf, maxDf); add documents or lower minDf.");
  }
  const terms = kept.map((id) => m.terms[id]);
  const idf = new Float64Array(kept.length);
  const columnOf = new Int32Array(m.terms.length).fill(-1);
  kept.forEach((id, j) => {
    idf[j] = Math.log((1 + n) / (1 + df[id])) + 1;
    columnOf[id] = j;
  });
  const vocabulary: TfidfVocabulary = { terms, idf, index: indexTerms(terms) };
  if (options.headingWeight !== undefined) vocabulary.headingWeight = options.headingWeight;
  return { vocabulary, columnOf };
}

/** The dictionary id → column map of a CountMatrix under a vocabulary fitted elsewhere (a trained model's). */
export function columnsUnder(m: CountMatrix, vocabulary: TfidfVocabulary): Int32Array {
  return Int32Array.from(m.terms, (t) => vocabulary.index.get(t) ?? -1);
}

/** transformTokens (tfidf.ts) for rows of a CountMatrix: L2-normalised TF-IDF rows, unknown terms ignored. */
export function transformCountRows(m: CountMatrix, rowIds: ArrayLike<number>, columnOf: Int32Array, vocabulary: TfidfVocabulary): CsrMatrix {
  const indptr = new Int32Array(rowIds.length + 1);
  for (let r = 0; r < rowIds.length; r++) {
    const row = rowIds[r];
    let kept = 0;
    for (let k = m.indptr[row]; k < m.indptr[row + 1]; k++) if (columnOf[m.ids[k]] >= 0) kept++;
    indptr[r + 1] = indptr[r] + kept;
  }
  const indices = new Int32Array(indptr[rowIds.length]);
  const data = new Float64Array(indptr[rowIds.length]);
  let keys = new Float64Array(256);
  for (let r = 0; r < rowIds.length; r++) {
    const row = rowIds[r];
    const start = m.indptr[row];
    const len = indptr[r + 1] - indptr[r];
    if (keys.length < len) keys = new Float64Array(len * 2);
    // Sort the row by column: key = column · 2²⁴ + position in the row (columns are distinct).
    let q = 0;
    for (let k = start; k < m.indptr[row + 1]; k++) {
      const j = columnOf[m.ids[k]];
      if (j >= 0) keys[q++] = j * 16_777_216 + (k - start);
    }
    const sorted = keys.subarray(0, len).sort();
    const base = indptr[r];
    let norm = 0;
    for (let p = 0; p < len; p++) {
      const j = Math.floor(sorted[p] / 16_777_216);
      const k = start + (sorted[p] - j * 16_777_216);
      const v = (1 + Math.log(m.counts[k])) * vocabulary.idf[j];
      indices[base + p] = j;
      data[base + p] = v;
      norm += v * v;
    }
    norm = Math.sqrt(norm);
    for (let p = 0; p < len; p++) data[base + p] = data[base + p] / norm;
  }
  const x: CsrMatrix = { rows: rowIds.length, cols: vocabulary.terms.length, indptr, indices, data };
  if (vocabulary.headingWeight !== undefined) weighHeadingBlock(x, headingColumns(vocabulary), vocabulary.headingWeight);
  return x;
}

/** TF-IDF rows of stored counts under a trained vocabulary (suggesting from stored counts). */
export function transformCounts(counts: TermCounts[], vocabulary: TfidfVocabulary): CsrMatrix {
  const builder = new CountMatrixBuilder();
  for (const c of counts) builder.add(c);
  const m = builder.build();
  return transformCountRows(m, Int32Array.from({ length: m.rows }, (_, i) => i), columnsUnder(m, vocabulary), vocabulary);
}

/** 0, 1, …, n − 1. */
export function allRows(n: number): Int32Array {
  return Int32Array.from({ length: n }, (_, i) => i);
}

/**
 * The training rows plus one pseudo-row per cabinet type being learned (its name, description and
 * keywords; model-features.ts), in a CountMatrix that extends `m` (m itself is not changed).
 */
export function appendPriorRows(
  m: CountMatrix,
  rowIds: ArrayLike<number>,
  labels: string[],
  priors: TypePrior[],
  classes: string[],
  options: TokenizeOptions,
): { matrix: CountMatrix; rowIds: Int32Array; labels: string[] } | null {
  const known = new Set(classes);
  const docs = buildPriorDocuments(priors.filter((p) => known.has(p.label)));
  if (docs.length === 0) return null;
  const index = new Map<string, number>();
  const extraIds: number[] = [];
  const extraCounts: number[] = [];
  const extraPtr: number[] = [];
  for (const d of docs) {
    for (const [t, c] of countTokenList(tokenizeDocument(d, options))) {
      let id = index.get(t);
      if (id === undefined) {
        id = index.size;
        index.set(t, id);
      }
      extraIds.push(id);
      extraCounts.push(c);
    }
    extraPtr.push(extraIds.length);
  }
  // New terms first get ids of their own; map those that the dictionary already had back to theirs.
  const old = new Map<string, number>();
  const want = new Set(index.keys());
  m.terms.forEach((t, id) => {
    if (want.has(t)) old.set(t, id);
  });
  const finalTerms = m.terms.slice();
  const remap = new Map<number, number>();
  for (const [t, id] of index) {
    const existing = old.get(t);
    if (existing !== undefined) remap.set(id, existing);
    else {
      remap.set(id, finalTerms.length);
      finalTerms.push(t);
    }
  }
  const nnz = m.indptr[m.rows];
  const ids = new Int32Array(nnz + extraIds.length);
  const counts = new Int32Array(nnz + extraIds.length);
  ids.set(m.ids.subarray(0, nnz));
  counts.set(m.counts.subarray(0, nnz));
  extraIds.forEach((id, k) => {
    ids[nnz + k] = remap.get(id)!;
    counts[nnz + k] = extraCounts[k];
  });
  const indptr = new Int32Array(m.rows + docs.length + 1);
  indptr.set(m.indptr.subarray(0, m.rows + 1));
  extraPtr.forEach((p, r) => (indptr[m.rows + 1 + r] = nnz + p));
  const matrix: CountMatrix = { rows: m.rows + docs.length, terms: finalTerms, indptr, ids, counts };
  const all = new Int32Array(rowIds.length + docs.length);
  for (let i = 0; i < rowIds.length; i++) all[i] = rowIds[i];
  for (let r = 0; r < docs.length; r++) all[rowIds.length + r] = m.rows + r;
  return { matrix, rowIds: all, labels: [...labels, ...docs.map((d) => d.label)] };
}
