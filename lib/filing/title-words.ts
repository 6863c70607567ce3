// Title words that tell one matter of a client from its others ("lease renewal" against
// "bookkeeping and tax return"). A word counts by its first five letters, a crude stem that lets
// "renewal" meet "renew" and "leases" meet "lease" without a language model. One common word is
// not enough ("please return them" must not pin the tax-return matter): a pin needs half the
// distinctive words and at least two of them, unless the title has only one.
import { splitWords } from "./find-identifiers";

const PREFIX = 5;
const MIN_LETTERS = 3;
const MIN_HITS = 2;
const SKIP = new Set(["and", "the", "for", "with", "from", "into", "new", "old", "other", "matter", "matters"]);
const PIN_SHARE = 0.5;

/** Stem of one lower-case word, or null for short words and numbers. */
export function stemTitleWord(word: string): string | null {
  return word.length >= MIN_LETTERS && /^[a-z]+$/.test(word) && !SKIP.has(word) ? word.slice(0, PREFIX) : null;
}

/** The stems of every word of a text, for title look-ups. */
export function collectStems(words: string[]): Set<string> {
  const out = new Set<string>();
  for (const w of words) {
    const s = stemTitleWord(w);
    if (s !== null) out.add(s);
  }
  return out;
}

/** Title words of a matter as [stem, word] pairs. */
function titleWords(title: string): [string, string][] {
  return splitWords(title).flatMap((w) => {
    const s = stemTitleWord(w);
    return s === null ? [] : [[s, w] as [string, string]];
  });
}

/**
 * Matters of one client whose distinctive title words are at least half present in the text (and
 * at least two of them),
 * keeping only those with the highest share; each maps to the words found, for the reason line.
 */
export function findPinningTitles<M extends { id: number; title: string }>(group: M[], textStems: Set<string>): Map<number, string> {
  const found = new Map<number, string>();
  if (group.length < 2) return found;
  const titles = group.map((m) => titleWords(m.title));
  let bestShare = 0;
  const shares = group.map((m, i) => {
    const others = new Set(titles.flatMap((t, j) => (j === i ? [] : t.map(([s]) => s))));
    const own = titles[i].filter(([s]) => !others.has(s));
    const hits = own.filter(([s]) => textStems.has(s));
    const enough = hits.length >= Math.min(MIN_HITS, own.length);
    const share = own.length === 0 || !enough ? 0 : hits.length / own.length;
    if (share >= PIN_SHARE && share > bestShare) bestShare = share;
    return { id: m.id, share, words: hits.map(([, w]) => w).join(" ") };
  });
  for (const s of shares) if (bestShare > 0 && s.share === bestShare) found.set(s.id, s.words);
  return found;
}
