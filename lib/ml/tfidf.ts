// Tokens → TF-IDF rows (DESIGN.md §5), the same definitions as scikit-learn's TfidfVectorizer:
//   tf(t, d)  = 1 + ln(count of t in d)            (sublinear tf)
//   idf(t)    = ln((1 + n) / (1 + df(t))) + 1      (smooth idf; n = documents seen in fit)
//   row       = tf · idf scaled to unit L2 norm
// Vocabulary: terms with df ≥ minDf and df ≤ maxDf·n, then the maxFeatures most frequent over the
// corpus (ties by term), finally sorted by term so the column order is reproducible.
// With a heading weight (model-features.ts), the `head:` terms form a second block: each block is
// scaled to unit L2 norm on its own and the heading block is then multiplied by its weight, like
// two TfidfVectorizers stacked side by side. Without one, the whole row is one block as above.
import { type CsrMatrix } from "./csr";
import { HEADING_PREFIX } from "./tokenize";

export interface TfidfOptions {
  /** Minimum number of documents a term must appear in (absolute count). */
  minDf: number;
  /** Maximum share of documents a term may appear in, in (0, 1]. */
  maxDf: number;
  /** Size cap on the vocabulary. */
  maxFeatures: number;
  /** Weight of the heading block (`head:` terms) beside the body's 1; absent: one block. */
  headingWeight?: number;
  /** minDf of the heading terms (default: minDf). */
  headingMinDf?: number;
}

export const DEFAULT_TFIDF_OPTIONS: TfidfOptions = { minDf: 2, maxDf: 1, maxFeatures: 200_000 };

export interface TfidfVocabulary {
  terms: string[];
  idf: Float64Array;
  /** term → column, rebuilt from `terms` after loading. */
  index: Map<string, number>;
  /** Weight of the heading block; absent: the row is one block (models from before it). */
  headingWeight?: number;
}

/** Counts each token of one document. */
function countTokens(tokens: string[]): Map<string, number> {
  const counts = new Map<string, number>();
  for (const t of tokens) counts.set(t, (counts.get(t) ?? 0) + 1);
  return counts;
}

/** Checks the options before fitting, like scikit-learn does. */
function checkOptions(o: TfidfOptions): void {
  if (!Number.isInteger(o.minDf) || o.minDf < 1) throw new Error(`minDf must be a whole number ≥ 1, got ${o.minDf}.`);
  if (!(o.maxDf > 0 && o.maxDf <= 1)) throw new Error(`maxDf must be in (0, 1], got ${o.maxDf}.`);
  if (!Number.isInteger(o.maxFeatures) || o.maxFeatures < 1) {
    throw new Error(`maxFeatures must be a whole number ≥ 1, got ${o.maxFeatures}.`);
  }
  if (o.headingWeight !== undefined && !(o.headingWeight >= 0 && Number.isFinite(o.headingWeight))) {
    throw new Error(`headingWeight must be a number ≥ 0, got ${o.headingWeight}.`);
  }
  if (o.headingMinDf !== undefined && !(Number.isInteger(o.headingMinDf) && o.headingMinDf >= 1)) {
    throw new Error(`headingMinDf must be a whole number ≥ 1, got ${o.headingMinDf}.`);
  }
}

/** Learns the vocabulary and idf from tokenised training documents. */
export function fitVocabulary(docs: string[][], options: TfidfOptions = DEFAULT_TFIDF_OPTIONS): TfidfVocabulary {
  checkOptions(options);
  const n = docs.length;
  if (n === 0) throw new Error("Cannot fit a vocabulary on zero documents.");
  const df = new Map<string, number>();
  const total = new Map<string, number>();
  for (const tokens of docs) {
    for (const [t, c] of countTokens(tokens)) {
      df.set(t, (df.get(t) ?? 0) + 1);
      total.set(t, (total.get(t) ?? 0) + c);
    }
  }
  const maxDocs = Math.floor(options.maxDf * n + 1e-9);
  const headingMinDf = options.headingMinDf ?? options.minDf;
  let kept = [...df.keys()].filter((t) => {
    const d = df.get(t)!;
    return d >= (t.startsWith(HEADING_PREFIX) ? headingMinDf : options.minDf) && d <= maxDocs;
  });
  if (kept.length > options.maxFeatures) {
    kept.sort((a, b) => total.get(b)! - total.get(a)! || (a < b ? -1 : a > b ? 1 : 0));
    kept = kept.slice(0, options.maxFeatures);
  }
  kept.sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  if (kept.length === 0) {
    throw new Error("No term passed the vocabulary limits (minDf, maxDf); add documents or lower minDf.");
  }
  const idf = new Float64Array(kept.length);
  kept.forEach((t, j) => {
    idf[j] = Math.log((1 + n) / (1 + df.get(t)!)) + 1;
  });
  const vocab: TfidfVocabulary = { terms: kept, idf, index: indexTerms(kept) };
  if (options.headingWeight !== undefined) vocab.headingWeight = options.headingWeight;
  return vocab;
}

/** Rebuilds the term → column map (after loading a model). */
export function indexTerms(terms: string[]): Map<string, number> {
  const index = new Map<string, number>();
  terms.forEach((t, j) => index.set(t, j));
  return index;
}

/** Turns tokenised documents into L2-normalised TF-IDF rows; unknown terms are ignored. */
export function transformTokens(docs: string[][], vocab: TfidfVocabulary): CsrMatrix {
  const indptr = new Int32Array(docs.length + 1);
  const cols: number[] = [];
  const vals: number[] = [];
  docs.forEach((tokens, i) => {
    const row: Array<[number, number]> = [];
    for (const [t, c] of countTokens(tokens)) {
      const j = vocab.index.get(t);
      if (j !== undefined) row.push([j, (1 + Math.log(c)) * vocab.idf[j]]);
    }
    row.sort((a, b) => a[0] - b[0]);
    let norm = 0;
    for (const [, v] of row) norm += v * v;
    norm = Math.sqrt(norm);
    for (const [j, v] of row) {
      cols.push(j);
      vals.push(v / norm);
    }
    indptr[i + 1] = cols.length;
  });
  const x: CsrMatrix = {
    rows: docs.length,
    cols: vocab.terms.length,
    indptr,
    indices: Int32Array.from(cols),
    data: Float64Array.from(vals),
  };
  if (vocab.headingWeight !== undefined) weighHeadingBlock(x, headingColumns(vocab), vocab.headingWeight);
  return x;
}

/** 1 for the columns of heading terms; cached per vocabulary. */
const headingMasks = new WeakMap<TfidfVocabulary, Uint8Array>();
export function headingColumns(vocab: TfidfVocabulary): Uint8Array {
  let mask = headingMasks.get(vocab);
  if (mask === undefined) {
    mask = Uint8Array.from(vocab.terms, (t) => (t.startsWith(HEADING_PREFIX) ? 1 : 0));
    headingMasks.set(vocab, mask);
  }
  return mask;
}

/**
 * Rescales, in place, every row of L2-normalised TF-IDF so that its body block has unit norm and
 * its heading block (columns where `isHeading`) has norm `weight`. Any uniform scale of a row is
 * undone, so it applies to rows normalised as one block, however they were built.
 */
export function weighHeadingBlock(x: CsrMatrix, isHeading: Uint8Array, weight: number): void {
  for (let i = 0; i < x.rows; i++) {
    let body = 0;
    let head = 0;
    for (let p = x.indptr[i]; p < x.indptr[i + 1]; p++) {
      const v = x.data[p] * x.data[p];
      if (isHeading[x.indices[p]]) head += v;
      else body += v;
    }
    const bodyScale = body > 0 ? 1 / Math.sqrt(body) : 0;
    const headScale = head > 0 ? weight / Math.sqrt(head) : 0;
    for (let p = x.indptr[i]; p < x.indptr[i + 1]; p++) x.data[p] *= isHeading[x.indices[p]] ? headScale : bodyScale;
  }
}
