// Matter candidates from the identifiers in a document (DESIGN.md §5 "Matter matching").
//
// Scoring (common practice for evidence scoring, tuned by hand on invented examples; no source):
//   Each signal found is a piece of evidence with a fixed strength s in (0, 1), and the pieces
//   combine as a noisy-OR, 1 − Π(1 − sᵢ), so more evidence only ever raises a score, never past 1.
//     matter number in the text or file name ........ 0.90  (names one matter outright)
//     client's registered name ........................ 0.60  (names the client, not the matter)
//     one of the client's aliases ..................... 0.50  (only the stronger of name/alias counts)
//     tax ID ending of the client ..................... 0.60
//     e-mail address on the client's domain ........... 0.50
//   The client signals (name, alias, tax ID, e-mail) combine into one client score c, which is
//   shared among the client's matters: each open matter has weight 1 and each closed one 0.5,
//   and a matter gets c·weight/Σweights. A matter is "pinned" when its number is in the text, or
//   when at least half (and at least two) of the title words that set it apart from the client's
//   other matters are ("lease renewal" for "Shop lease renewal"); pinned matters share c, the
//   others keep a residue of 0.1·c. A closed matter's final score is multiplied by 0.75, because
//   new paper mostly belongs to live work, but a clerk may still file to it.
//   decideMatter picks the best candidate when it reaches 0.5 and leads the next by at least 0.15;
//   otherwise the document goes to review with the candidates.
import { buildMatterNumberPattern, coreNameWords, countPhrase, findEmailDomains, findTaxIdEndings, indexWords, isDomainOf, splitWords } from "./find-identifiers";
import { collectStems, findPinningTitles } from "./title-words";

export interface MatterRecord {
  id: number;
  number: string;
  title: string;
  clientName: string;
  aliases: string[];
  emailDomains: string[];
  taxIdLast4: string | null;
  status: "open" | "closed";
}

export interface MatterCandidate {
  matterId: number;
  /** 0..1, see the scheme at the top of this file. */
  score: number;
  /** Short human words saying what was found, e.g. "matter number AQ-2026-0101". */
  reasons: string[];
}

export const SIGNAL = { number: 0.9, name: 0.6, alias: 0.5, taxId: 0.6, email: 0.5 } as const;
const CLOSED_WEIGHT = 0.5;
const CLOSED_FACTOR = 0.75;
const RESIDUE = 0.1;
export const DECIDE_MIN_SCORE = 0.5;
export const DECIDE_MIN_MARGIN = 0.15;

/** Combines independent evidence strengths: 1 − Π(1 − s). */
function combine(strengths: number[]): number {
  return 1 - strengths.reduce((rest, s) => rest * (1 - s), 1);
}

interface ClientEvidence {
  strengths: number[];
  reasons: string[];
}

/** Evidence that the document concerns this client, whatever the matter. */
function findClientEvidence(m: MatterRecord, words: string[], index: Map<string, number[]>, domains: Set<string>, taxEndings: Set<string>): ClientEvidence {
  const strengths: number[] = [];
  const reasons: string[] = [];
  if (countPhrase(words, index, coreNameWords(m.clientName)) > 0) {
    strengths.push(SIGNAL.name);
    reasons.push(`client name “${m.clientName}”`);
  } else {
    const alias = m.aliases.find((a) => countPhrase(words, index, coreNameWords(a)) > 0);
    if (alias !== undefined) {
      strengths.push(SIGNAL.alias);
      reasons.push(`client name “${alias}”`);
    }
  }
  const domain = m.emailDomains.find((d) => [...domains].some((found) => isDomainOf(found, d)));
  if (domain !== undefined) {
    strengths.push(SIGNAL.email);
    reasons.push(`e-mail domain ${domain.replace(/^@/, "").toLowerCase()}`);
  }
  if (m.taxIdLast4 !== null && taxEndings.has(m.taxIdLast4)) {
    strengths.push(SIGNAL.taxId);
    reasons.push(`tax ID ending ${m.taxIdLast4}`);
  }
  return { strengths, reasons };
}

/** Ranks the matters a document may belong to, best first; matters with no evidence are left out. */
export function matchMatters(text: string, fileName: string, matters: MatterRecord[]): MatterCandidate[] {
  // File names use _ . - as separators; as words they can name a client or a matter too.
  const haystack = `${text}\n${fileName}`;
  const words = splitWords(haystack);
  const index = indexWords(words);
  const domains = findEmailDomains(text);
  const taxEndings = findTaxIdEndings(text);
  const stems = collectStems(words);
  const numberHits = new Set(matters.filter((m) => buildMatterNumberPattern(m.number)?.test(haystack)).map((m) => m.id));

  const byClient = new Map<string, MatterRecord[]>();
  for (const m of matters) {
    const key = coreNameWords(m.clientName).join(" ");
    byClient.set(key, [...(byClient.get(key) ?? []), m]);
  }

  const out: MatterCandidate[] = [];
  for (const group of byClient.values()) {
    const evidence = findClientEvidence(group[0], words, index, domains, taxEndings);
    const c = combine(evidence.strengths);
    const titlePins = c > 0 ? findPinningTitles(group, stems) : new Map<number, string>();
    const pinned = group.filter((m) => numberHits.has(m.id) || titlePins.has(m.id));
    const weightOf = (m: MatterRecord) => (m.status === "closed" ? CLOSED_WEIGHT : 1);
    const pool = pinned.length > 0 ? pinned : group;
    const totalWeight = pool.reduce((sum, m) => sum + weightOf(m), 0);
    for (const m of group) {
      const inPool = pool.includes(m);
      const share = inPool ? (c * weightOf(m)) / totalWeight : c * RESIDUE;
      const strengths = [share];
      const reasons: string[] = [];
      if (numberHits.has(m.id)) {
        strengths.push(SIGNAL.number);
        reasons.push(`matter number ${m.number}`);
      }
      if (c > 0) reasons.push(...evidence.reasons);
      const title = titlePins.get(m.id);
      if (title !== undefined && c > 0) reasons.push(`matter title words “${title}”`);
      if (c > 0 && !inPool) reasons.push("another matter of this client fits better");
      else if (c > 0 && pool.length > 1 && !numberHits.has(m.id)) reasons.push(`client has ${pool.length} matters that fit`);
      let score = combine(strengths);
      if (score === 0) continue;
      if (m.status === "closed") {
        score *= CLOSED_FACTOR;
        reasons.push("matter is closed");
      }
      out.push({ matterId: m.id, score, reasons });
    }
  }
  // Ties keep the order the matters came in, so the result is deterministic.
  return out.sort((a, b) => b.score - a.score);
}

/**
 * The matter to file to, or null. `ambiguous` says a person should choose among the candidates:
 * the best is weak (below 0.5) or another is within 0.15 of it. No candidates: null, not ambiguous.
 */
export function decideMatter(candidates: MatterCandidate[]): { matterId: number | null; ambiguous: boolean } {
  const [best, second] = candidates;
  if (best === undefined) return { matterId: null, ambiguous: false };
  const weak = best.score < DECIDE_MIN_SCORE;
  const close = second !== undefined && best.score - second.score < DECIDE_MIN_MARGIN;
  return weak || close ? { matterId: null, ambiguous: true } : { matterId: best.matterId, ambiguous: false };
}
