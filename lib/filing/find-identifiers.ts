// The identifiers matter matching looks for, found in plain text. Each finder is deliberately
// narrow: a false "tax ID ending 4417" or a client name inside another word would send a
// document to the wrong client, which is worse than sending it to review.

/** Lower case, accents off, "&" as "and", apostrophes dropped ("O'Hare" = "OHare"), then words. */
export function splitWords(text: string): string[] {
  return text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/&/g, " and ")
    .replace(/['’]/g, "")
    .split(/[^a-z0-9]+/)
    .filter((w) => w !== "");
}

// Legal-form words say nothing about which client it is, and letters write them every which way
// ("LLC", "L.L.C.", "Inc." or nothing at all), so names are compared without them.
const LEGAL_FORMS = ["l l c", "llc", "l l p", "llp", "pllc", "inc", "incorporated", "co", "company", "corp", "corporation", "ltd", "limited", "p c", "pc", "plc", "lp", "p a", "pa", "gmbh"].map((f) => f.split(" "));

/** The words of a client name or alias without its legal form or a leading "the". */
export function coreNameWords(name: string): string[] {
  let words = splitWords(name);
  if (words[0] === "the" && words.length > 1) words = words.slice(1);
  let stripped = true;
  while (stripped) {
    stripped = false;
    for (const form of LEGAL_FORMS) {
      const start = words.length - form.length;
      if (start >= 1 && form.every((w, i) => words[start + i] === w)) {
        words = words.slice(0, start);
        stripped = true;
        break;
      }
    }
  }
  return words;
}

/** Where each word occurs, so a phrase search starts only at its first word's positions. */
export function indexWords(words: string[]): Map<string, number[]> {
  const index = new Map<string, number[]>();
  words.forEach((w, i) => {
    const at = index.get(w);
    if (at) at.push(i);
    else index.set(w, [i]);
  });
  return index;
}

/** How often a phrase occurs as whole consecutive words (word boundaries come for free). */
export function countPhrase(words: string[], index: Map<string, number[]>, phrase: string[]): number {
  if (phrase.length === 0) return 0;
  let count = 0;
  for (const start of index.get(phrase[0]) ?? []) {
    if (phrase.every((w, k) => words[start + k] === w)) count++;
  }
  return count;
}

/**
 * A pattern for a matter number that tolerates case and any run of spaces, dashes, dots, slashes
 * or underscores between its parts ("AQ-2026-0101", "aq 2026 0101", "AQ_2026_0101", "AQ20260101"),
 * and refuses a match glued to more letters or digits ("XAQ-2026-01019").
 */
export function buildMatterNumberPattern(number: string): RegExp | null {
  const parts = number.split(/[^A-Za-z0-9]+/).filter((p) => p !== "");
  if (parts.length === 0) return null;
  const body = parts.map((p) => p.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")).join("[\\s\\-\\u2010-\\u2015_./]*");
  return new RegExp(`(?<![A-Za-z0-9])${body}(?![A-Za-z0-9])`, "gi");
}

const EMAIL = /[A-Za-z0-9._%+-]+@([A-Za-z0-9-]+(?:\.[A-Za-z0-9-]+)+)/g;

/** Domains of the e-mail addresses in a text, lower case. */
export function findEmailDomains(text: string): Set<string> {
  const out = new Set<string>();
  for (const m of text.matchAll(EMAIL)) out.add(m[1].toLowerCase());
  return out;
}

/** True when `domain` is `clientDomain` or one of its subdomains ("mail.x.example" for "x.example"). */
export function isDomainOf(domain: string, clientDomain: string): boolean {
  const d = clientDomain.toLowerCase().replace(/^@/, "");
  return domain === d || domain.endsWith(`.${d}`);
}

// What may stand right before the last four digits of a tax ID: a run of mask characters that
// does not continue a word ("Box 4417" is not "x4417"), an ellipsis touching the digits, "ending
// (in)", "last four", or a tax-ID name. The nearest clue word on the line then decides: "card
// ending 4417" is a card and "year ending 2025" a date, while "SSN ***-**-4417" is a tax ID.
const MASKED = /(?<![a-z0-9])[x*•●·]+(?:[\s-]*[x*•●·]+)*[\s-]*$/i;
const ELLIPSIS = /(?:\.{3}|…)$/;
const ENDING = /\b(?:ending|ends|end)(?:\s+(?:in|with))?[\s:]*$/i;
const LAST_FOUR = /\blast\s+(?:four|4)\b[^0-9]{0,25}$/i;
const TAX_NAME = String.raw`\b(?:EIN|TIN|ITIN|SSN|FEIN|tax\s*ID|taxpayer\s+ID(?:entification)?(?:\s+(?:no\.?|number))?|employer\s+identification\s+number)\b`;
const NAMED = new RegExp(`${TAX_NAME}[\\s:#.…]{0,6}$`, "i");
const IS_TAX_NAME = new RegExp(`^${TAX_NAME}$`, "i");
const CLUE = new RegExp(`${TAX_NAME}|\\b(?:account|acct|card|loan|policy|invoice|order|phone|period|year|month|quarter|week|date)\\b`, "gi");
const FULL_ID = new RegExp(`${TAX_NAME}[\\s:#.]{0,4}(\\d{2}-\\d{7}|\\d{3}-\\d{2}-\\d{4}|\\d{9})(?!\\d)`, "gi");

/** True when the text just before four digits marks them as the end of a tax ID. */
function marksTaxIdEnding(before: string): boolean {
  const line = before.slice(before.lastIndexOf("\n") + 1);
  if (NAMED.test(line)) return true;
  if (!(MASKED.test(line) || ELLIPSIS.test(line) || ENDING.test(line) || LAST_FOUR.test(line))) return false;
  const nearest = [...line.matchAll(CLUE)].at(-1);
  return nearest === undefined || IS_TAX_NAME.test(nearest[0]);
}

/** Last four digits of tax IDs written the way offices write them, never a bare number. */
export function findTaxIdEndings(text: string): Set<string> {
  const out = new Set<string>();
  for (const m of text.matchAll(/(?<!\d)\d{4}(?!\d)/g)) {
    if (marksTaxIdEnding(text.slice(Math.max(0, m.index - 40), m.index))) out.add(m[0]);
  }
  for (const m of text.matchAll(FULL_ID)) out.add(m[1].slice(-4));
  return out;
}
