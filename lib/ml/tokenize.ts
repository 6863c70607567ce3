// Text → tokens for the vectoriser (DESIGN.md §5): wink-nlp with wink-eng-lite-web-model, lower
// case, only word tokens that contain a letter, stop words out, Porter stems via wink's `its.stem`,
// unigrams plus bigrams of neighbouring kept words, and prefixed filename (`file:`), metadata
// (`meta:`) and, when asked, heading (`head:`) tokens so a filename or heading word never
// collides with the same word in the body.
import winkNLP from "wink-nlp";
import model from "wink-eng-lite-web-model";
import type { MlDocument } from "./types";

/**
 * The version of what tokenizeDocument makes of a document with the default options. Raise it
 * with ANY change to the tokens (rules, stemming, a new prefixed block such as a heading block):
 * the app keeps each document's term counts with this number and re-tokenises, in the background,
 * every document whose counts carry another (lib/data/document-terms.ts).
 */
export const TOKENIZER_VERSION = 2;

export interface TokenizeOptions {
  /** Drop wink's stop words (default true). */
  dropStopWords: boolean;
  /** Replace words by their Porter stems (default true). */
  stem: boolean;
  /** Add bigrams of neighbouring kept words (default true). */
  bigrams: boolean;
  /** Form bigrams over all words, stop words included ("shall not", "may assign"). */
  stopWordsInBigrams: boolean;
  /** Treat negations (not, no, nor, never, …) as ordinary words. */
  keepNegations: boolean;
  /**
   * Characters of the document's start that form its heading block (`head:` terms; see
   * model-features.ts). 0 or absent: no heading block (models trained before it have none).
   */
  headingChars?: number;
}

// Stop words leave the unigrams but stay inside bigrams, and negations stay words: on the CUAD
// clause split, dropping them everywhere cost 1.6 points of accuracy ("shall not", "may not
// assign" are what tell clause types apart), keeping them this way gained it back.
export const DEFAULT_TOKENIZE_OPTIONS: TokenizeOptions = {
  dropStopWords: true,
  stem: true,
  bigrams: true,
  stopWordsInBigrams: true,
  keepNegations: true,
};

type Nlp = ReturnType<typeof winkNLP>;

let nlp: Nlp | null = null;
// Stems depend only on the lower-cased word, and a few thousand words cover most of an office's
// text, so a per-process cache saves most of the stemming work.
const stemCache = new Map<string, string>();
const HAS_LETTER = /[a-z]/;

/** Loads the wink model once per process; the empty pipe skips tagging we do not use. */
function loadNlp(): Nlp {
  if (nlp === null) nlp = winkNLP(model, []);
  return nlp;
}

const NEGATIONS = new Set(["not", "no", "nor", "never", "neither", "none", "without", "cannot"]);

/** Words of a text in order, lower-cased and stemmed as asked, each with its stop-word flag. */
export function extractWords(text: string, options: TokenizeOptions = DEFAULT_TOKENIZE_OPTIONS): { words: string[]; stop: boolean[] } {
  const engine = loadNlp();
  const its = engine.its;
  const tokens = engine.readDoc(text).tokens();
  const normals = tokens.out(its.normal) as string[];
  const types = tokens.out(its.type) as string[];
  const flags = tokens.out(its.stopWordFlag) as unknown as boolean[];
  const words: string[] = [];
  const stop: boolean[] = [];
  for (let i = 0; i < normals.length; i++) {
    const normal = normals[i];
    // "'s" and one-letter words carry no filing signal.
    if (types[i] !== "word" || normal.length < 2 || normal[0] === "'" || !HAS_LETTER.test(normal)) continue;
    stop.push(flags[i] && !(options.keepNegations && NEGATIONS.has(normal)));
    if (!options.stem) {
      words.push(normal);
      continue;
    }
    let stem = stemCache.get(normal);
    if (stem === undefined) {
      // Only word tokens are stemmed: wink's stemmer turns "3:30" into nonsense.
      // wink 2.4 types its.stem with an extra parameter that out() supplies itself.
      stem = tokens.itemAt(i).out(its.stem as unknown as typeof its.normal);
      stemCache.set(normal, stem);
    }
    words.push(stem);
  }
  return { words, stop };
}

/** Unigrams (stop words out when asked) and bigrams of neighbouring words. */
export function buildTerms(words: string[], stop: boolean[], options: TokenizeOptions): string[] {
  const out: string[] = [];
  const kept: string[] = [];
  for (let i = 0; i < words.length; i++) {
    if (!(options.dropStopWords && stop[i])) kept.push(words[i]);
  }
  out.push(...kept);
  if (!options.bigrams) return out;
  const seq = options.stopWordsInBigrams ? words : kept;
  for (let i = 1; i < seq.length; i++) out.push(`${seq[i - 1]} ${seq[i]}`);
  return out;
}

/** Prefix of the heading block's terms: "head:agreement" never meets the body's "agreement". */
export const HEADING_PREFIX = "head:";
/** The heading block needs a text at least this many times longer than the heading. */
export const HEADING_BODY_RATIO = 3;

/**
 * The heading a document's kind is read from: the reader's own heading when it has one (e.g. the
 * largest-type lines of a PDF's first page), else the text's first `chars` characters, cut back
 * to a word boundary.
 */
export function headingText(doc: MlDocument, chars: number): string {
  if (doc.heading !== undefined && doc.heading.trim() !== "") return doc.heading.slice(0, chars * 2);
  const text = doc.text;
  if (text.length <= chars) return text;
  const cut = text.slice(0, chars);
  const space = cut.search(/\s\S*$/);
  return space > chars / 2 ? cut.slice(0, space) : cut;
}

/** Buckets the page count so one-page letters and long contracts get different tokens. */
export function bucketPages(pages: number): string {
  if (pages <= 1) return "1";
  if (pages <= 3) return "2-3";
  if (pages <= 10) return "4-10";
  return "11+";
}

/** Turns a document into its feature tokens (repeats kept: the vectoriser counts them). */
export function tokenizeDocument(doc: MlDocument, options: TokenizeOptions = DEFAULT_TOKENIZE_OPTIONS): string[] {
  const { words, stop } = extractWords(doc.text, options);
  const out = buildTerms(words, stop, options);
  if (doc.filename) {
    // Filenames use _ . - as separators; spaces let wink split them into words.
    const spaced = doc.filename.replace(/\.[A-Za-z0-9]{1,5}$/, "").replace(/[_.\-]+/g, " ");
    const fileWords = extractWords(spaced, options);
    fileWords.words.forEach((w, i) => {
      if (!(options.dropStopWords && fileWords.stop[i])) out.push(`file:${w}`);
    });
  }
  const headingChars = options.headingChars ?? 0;
  // A text not much longer than its heading has no separate heading (a clause, a short note):
  // a block over it would only repeat the body (on the CUAD clause spans it cost 0.6 points of
  // accuracy and 2.2 of macro-F1). A reader's own heading always counts.
  if (headingChars > 0 && (doc.heading !== undefined || doc.text.length > HEADING_BODY_RATIO * headingChars)) {
    const heading = extractWords(headingText(doc, headingChars), options);
    for (const t of buildTerms(heading.words, heading.stop, options)) out.push(HEADING_PREFIX + t);
  }
  const meta = doc.meta;
  if (meta?.kind) out.push(`meta:kind=${meta.kind.toLowerCase()}`);
  if (meta?.pages !== undefined && Number.isFinite(meta.pages)) out.push(`meta:pages=${bucketPages(meta.pages)}`);
  if (meta?.ocr !== undefined) out.push(`meta:ocr=${meta.ocr ? "yes" : "no"}`);
  return out;
}
