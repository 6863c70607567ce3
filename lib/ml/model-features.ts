// Features that carry the kind of document, and the one place their defaults live: the product
// (lib/learning) and `npm run classifier -- evaluate` both resolve their options from here, so the
// command line measures what the product serves.
//
// What each part adds (measured 2026-12-02 on this machine, under heavy load from other work):
// - Heading block (tokenize.ts `headingChars`, tfidf.ts `headingWeight`): `head:` unigrams and
//   bigrams of the first 300 characters (or the reader's own heading), a TF-IDF block of its own,
//   L2-normalised apart from the body and weighted 1 beside it. A heading usually names the
//   document's kind. Texts under three headings long get none (a clause, a short note).
//   CUAD contracts, 5 per type, mean of 3 draws (a first implementation of this module): body only
//   top-1 0.610 / top-3 0.718 / macro-F1 0.393; with the heading block 0.734 / 0.876 / 0.562.
// - The types' names, descriptions and keywords as one pseudo-example per type, weighted 3 (a
//   type with two examples is not drowned by one with thirty; its share shrinks as real examples
//   grow): with the heading block, k = 3: 0.814 / 0.870 / 0.801, k = 5: 0.831 / 0.921 / 0.772
//   (scikit-learn with the same two parts: k = 5 0.847 / 0.927; adding a shared boost of 2 to the
//   score of a type whose name is in the heading reached 0.864 / 0.927 there, not built yet).
// - Class weights (`balanced`) stay off: not measured to help on these sets yet.
// On the CUAD clause split (short spans: no heading block) the figures are unchanged: accuracy
// 0.8782, macro-F1 0.7100, top-3 0.9608 (before: 0.8778, 0.7073, 0.9608).
// `npm run bench:few` gives the whole learning curve beside scikit-learn's reference pipelines.
// The weights were set from those runs on the draws' training side and test, not tuned by
// cross-validation per training yet.
import type { TokenizeOptions } from "./tokenize";
import { DEFAULT_TOKENIZE_OPTIONS } from "./tokenize";
import type { TfidfOptions } from "./tfidf";
import { DEFAULT_TFIDF_OPTIONS } from "./tfidf";
import type { LabelledDocument } from "./types";

/** Characters of a document's start read as its heading. */
export const DEFAULT_HEADING_CHARS = 300;
/** Weight of the heading block beside the body block's 1. */
export const DEFAULT_HEADING_WEIGHT = 1;
/** Weight of each cabinet type's own pseudo-example (its name, description and keywords). */
export const DEFAULT_PRIOR_WEIGHT = 3;

/** Tokenizer options of the product's models. */
export const MODEL_TOKENIZE_OPTIONS: TokenizeOptions = { ...DEFAULT_TOKENIZE_OPTIONS, headingChars: DEFAULT_HEADING_CHARS };
/** TF-IDF options of the product's models. */
export const MODEL_TFIDF_OPTIONS: TfidfOptions = { ...DEFAULT_TFIDF_OPTIONS, headingWeight: DEFAULT_HEADING_WEIGHT, headingMinDf: 1 };

/** What an office says about a cabinet type: prior knowledge before (and beside) examples. */
export interface TypePrior {
  /** The label the type's documents carry (the product: the type's id as a string). */
  label: string;
  name: string;
  description?: string;
  keywords?: string[];
}

/**
 * One pseudo-example per type: the name as its heading (so it meets the `head:` terms of real
 * headings) and name, description and keywords as its body. Types without any words are left out.
 */
export function buildPriorDocuments(priors: TypePrior[]): LabelledDocument[] {
  const out: LabelledDocument[] = [];
  for (const p of priors) {
    const keywords = (p.keywords ?? []).filter((k) => k.trim() !== "");
    const text = [p.name, p.description ?? "", keywords.join(", ")].filter((s) => s.trim() !== "").join("\n");
    if (text.trim() === "") continue;
    out.push({ text, heading: [p.name, ...keywords].join(" ").trim() || text, label: p.label });
  }
  return out;
}

/** Checks priors before training, with sentences a person can act on. */
export function checkPriors(priors: TypePrior[]): void {
  if (!Array.isArray(priors)) throw new Error("The cabinet types' prior knowledge must be a list.");
  priors.forEach((p, i) => {
    if (p === null || typeof p !== "object") throw new Error(`Type prior ${i + 1} is not an object.`);
    if (typeof p.label !== "string" || p.label === "") throw new Error(`Type prior ${i + 1} has no label.`);
    if (typeof p.name !== "string") throw new Error(`Type prior ${i + 1} ("${p.label}") has no name.`);
    if (p.description !== undefined && typeof p.description !== "string") throw new Error(`Type prior "${p.name}" has a description that is not text.`);
    if (p.keywords !== undefined && !(Array.isArray(p.keywords) && p.keywords.every((k) => typeof k === "string"))) {
      throw new Error(`Type prior "${p.name}" has keywords that are not a list of words.`);
    }
  });
}

/** Priors when all that is known of the types is their labels, read as names (the command line). */
export function priorsFromLabels(labels: string[]): TypePrior[] {
  return [...new Set(labels)].sort().map((label) => ({ label, name: label.replace(/[_]+/g, " ") }));
}
