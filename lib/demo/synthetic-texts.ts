// Labelled texts at benchmark scale (10,000 documents × 30 classes in well under a second), for
// speed and quality runs where real files would only slow things down. Words are invented
// syllable strings, so no class can lean on an English word a tokenizer treats specially.
//
// Model of a document: 60–240 words; each word comes from the class's own vocabulary with
// probability 0.05, from its "neighbour" class's vocabulary with 0.03 (classes k and k+1 share
// topics the way letters and notices do), and otherwise from a common vocabulary. Within each
// vocabulary words follow a Zipf law (weight 1/rank), as words do in real text. At these mixing
// rates lib/ml's model gets about 0.86–0.9 right in 5-fold cross-validation with 30 documents a
// class, and more with more documents: realistic, not perfect.
import { createRandom, type Random } from "./random";

export interface SyntheticOptions {
  count: number;
  /** Number of classes (labels "class-01", …) or the labels themselves. */
  classes: number | string[];
  seed: number;
  /** Shares of words from the class's own and its neighbour's vocabulary (defaults below). */
  mix?: { own: number; neighbour: number };
}

const SYLLABLES = ["ba", "ce", "di", "fo", "gu", "ha", "ke", "li", "mo", "nu", "pa", "re", "si", "to", "vu", "wa", "xe", "yo", "za", "bro", "cle", "dra", "fli", "gro", "pla", "tre", "sto", "qua", "lem", "rin", "dor", "mar", "ven", "sol", "tup", "kal"];
const COMMON_WORDS = 3000;
const CLASS_WORDS = 120;
export const DEFAULT_MIX = { own: 0.05, neighbour: 0.03 };

/** Distinct invented words, three to four syllables so they rarely collide. */
function inventWords(rng: Random, count: number, taken: Set<string>): string[] {
  const out: string[] = [];
  while (out.length < count) {
    const n = rng.int(3, 4);
    let w = "";
    for (let i = 0; i < n; i++) w += rng.pick(SYLLABLES);
    if (!taken.has(w)) {
      taken.add(w);
      out.push(w);
    }
  }
  return out;
}

/** Cumulative Zipf weights (1/rank) for sampling by binary search. */
function zipfTable(size: number): Float64Array {
  const c = new Float64Array(size);
  let total = 0;
  for (let r = 0; r < size; r++) c[r] = total += 1 / (r + 1);
  for (let r = 0; r < size; r++) c[r] /= total;
  return c;
}

function sampleZipf(table: Float64Array, u: number): number {
  let lo = 0;
  let hi = table.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (table[mid] < u) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** `count` labelled texts, classes taken in turn so each has count/classes documents (±1). */
export function generateSyntheticTexts(options: SyntheticOptions): { text: string; label: string }[] {
  const labels = typeof options.classes === "number" ? Array.from({ length: options.classes }, (_, k) => `class-${String(k + 1).padStart(2, "0")}`) : options.classes;
  if (labels.length < 1) throw new Error("Synthetic texts need at least one class.");
  if (!Number.isInteger(options.count) || options.count < 0) throw new Error(`count must be a whole number of texts (0 or more), got ${options.count}.`);
  const rng = createRandom(options.seed);
  const taken = new Set<string>();
  const common = inventWords(rng, COMMON_WORDS, taken);
  const own = labels.map(() => inventWords(rng, CLASS_WORDS, taken));
  const commonTable = zipfTable(COMMON_WORDS);
  const classTable = zipfTable(CLASS_WORDS);
  const { own: ownShare, neighbour: neighbourShare } = options.mix ?? DEFAULT_MIX;
  const out: { text: string; label: string }[] = new Array(options.count);
  for (let i = 0; i < options.count; i++) {
    const k = i % labels.length;
    const neighbour = own[(k + 1) % labels.length];
    const length = rng.int(60, 240);
    const words: string[] = new Array(length);
    for (let j = 0; j < length; j++) {
      const u = rng.next();
      if (u < ownShare) words[j] = own[k][sampleZipf(classTable, rng.next())];
      else if (u < ownShare + neighbourShare) words[j] = neighbour[sampleZipf(classTable, rng.next())];
      else words[j] = common[sampleZipf(commonTable, rng.next())];
    }
    out[i] = { text: words.join(" "), label: labels[k] };
  }
  return out;
}
