// Cold start (DESIGN.md §5): before any model exists, or for a cabinet type with too few filed
// examples, types are ranked by how much a document reads like their admin-written profile.
//
// Tokens come from lib/ml's tokenizeDocument, so stems and bigrams are the model's own; filename
// words (`file:` tokens) count as ordinary words, since a file called "invoice_0412.pdf" says as
// much as the word in the text. One profile per type, a weighted term frequency over its parts:
//   tf(t, type) = Σ_part wₚ · (1 + ln count of t in the part),  w = 2 name, 1 description, 3 keywords
// (keywords are what an admin chose to say "this is the type"; the description is prose with
// filler words). Then the lib/ml TF-IDF definitions with the profiles as the corpus:
//   idf(t) = ln((1 + n) / (1 + df(t))) + 1, n = number of types;  doc tf = 1 + ln count
// rows L2-normalised (the document's over all its terms); score = cosine(document, profile) in [0, 1].
// Confidence = softmax(score / T) with T = 0.1: cosines of a real document against short profiles
// are small (about 0.1–0.5 for the right type), and at T = 0.1 a lead of 0.2 in cosine makes
// e² ≈ 7.4 times the confidence, so a clear invoice reads about 0.5–0.9 and a vague letter stays
// modest, while no lead at all (empty text) leaves every type at 1/n. Ties keep `types` order.
import { tokenizeDocument } from "@/lib/ml";

export { blendWithModel, type BlendedType, type ModelRankedType } from "./blend-with-model";

export interface TypeProfileInput {
  id: number;
  name: string;
  description: string;
  keywords: string[];
}

export interface ColdRankedType {
  cabinetTypeId: number;
  /** Cosine similarity to the type's profile, 0..1. */
  score: number;
  /** softmax(score / T) over all types; sums to 1. */
  confidence: number;
}

export interface ColdStartRanking {
  ranked: ColdRankedType[];
  /** Document terms (stems, bigrams) that matched the top type, strongest first. */
  terms: string[];
}

export interface TypeProfiles {
  ids: number[];
  /** One L2-normalised tf·idf vector per type. */
  vectors: Map<string, number>[];
  idf: Map<string, number>;
}

export const PART_WEIGHTS = { name: 2, description: 1, keywords: 3 } as const;
export const TEMPERATURE = 0.1;
const TERM_COUNT = 8;

/** Counts tokens, reading filename tokens as plain words. */
function countTerms(tokens: string[]): Map<string, number> {
  const counts = new Map<string, number>();
  for (const token of tokens) {
    if (token.startsWith("meta:")) continue;
    const t = token.startsWith("file:") ? token.slice(5) : token;
    counts.set(t, (counts.get(t) ?? 0) + 1);
  }
  return counts;
}

/** Scales a sparse vector to unit length (an all-zero vector stays as it is). */
function normalise(v: Map<string, number>): Map<string, number> {
  let sum = 0;
  for (const x of v.values()) sum += x * x;
  const norm = Math.sqrt(sum);
  if (norm > 0) for (const [t, x] of v) v.set(t, x / norm);
  return v;
}

/** Weighted term frequencies of one type's name, description and keywords. */
function profileFrequencies(type: TypeProfileInput): Map<string, number> {
  const tf = new Map<string, number>();
  const parts: [string, number][] = [
    [type.name, PART_WEIGHTS.name],
    [type.description, PART_WEIGHTS.description],
    ...type.keywords.map((k): [string, number] => [k, PART_WEIGHTS.keywords]),
  ];
  for (const [text, weight] of parts) {
    for (const [t, c] of countTerms(tokenizeDocument({ text }))) tf.set(t, (tf.get(t) ?? 0) + weight * (1 + Math.log(c)));
  }
  return tf;
}

/** Builds the TF-IDF profile of every type once, for ranking many documents. */
export function buildTypeProfiles(types: TypeProfileInput[]): TypeProfiles {
  const frequencies = types.map(profileFrequencies);
  const df = new Map<string, number>();
  for (const tf of frequencies) for (const t of tf.keys()) df.set(t, (df.get(t) ?? 0) + 1);
  const n = types.length;
  const idf = new Map([...df].map(([t, d]) => [t, Math.log((1 + n) / (1 + d)) + 1]));
  const vectors = frequencies.map((tf) => normalise(new Map([...tf].map(([t, f]) => [t, f * idf.get(t)!]))));
  return { ids: types.map((t) => t.id), vectors, idf };
}

/** softmax(s / T), shifted by the maximum so exp never overflows. */
function softmax(scores: number[], temperature: number): number[] {
  const top = Math.max(...scores);
  const e = scores.map((s) => Math.exp((s - top) / temperature));
  const total = e.reduce((a, b) => a + b, 0);
  return e.map((x) => x / total);
}

/** Ranks types for one document against prepared profiles. */
export function rankByProfiles(doc: { text: string; filename?: string }, profiles: TypeProfiles): ColdStartRanking {
  if (profiles.ids.length === 0) return { ranked: [], terms: [] };
  // Words no profile has still count in the document's length, with the idf of a term seen in no
  // profile, so a long document that is mostly about something else scores low.
  const unseenIdf = Math.log(1 + profiles.ids.length) + 1;
  const x = new Map<string, number>();
  for (const [t, c] of countTerms(tokenizeDocument({ text: doc.text, filename: doc.filename }))) {
    x.set(t, (1 + Math.log(c)) * (profiles.idf.get(t) ?? unseenIdf));
  }
  normalise(x);
  const scores = profiles.vectors.map((v) => {
    let dot = 0;
    for (const [t, xt] of x) dot += xt * (v.get(t) ?? 0);
    return dot;
  });
  const confidences = softmax(scores, TEMPERATURE);
  const order = profiles.ids.map((_, k) => k).sort((a, b) => scores[b] - scores[a] || a - b);
  const ranked = order.map((k) => ({ cabinetTypeId: profiles.ids[k], score: scores[k], confidence: confidences[k] }));
  const top = profiles.vectors[order[0]];
  const terms = [...x]
    .map(([t, xt]) => [t, xt * (top.get(t) ?? 0)] as const)
    .filter(([, w]) => w > 0)
    .sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1))
    .slice(0, TERM_COUNT)
    .map(([t]) => t);
  return { ranked, terms };
}

/** Ranks cabinet types for a document by their descriptions and keywords alone. */
export function rankByDescription(doc: { text: string; filename?: string }, types: TypeProfileInput[]): ColdStartRanking {
  return rankByProfiles(doc, buildTypeProfiles(types));
}
