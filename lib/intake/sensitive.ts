import { CARD_PATTERN, isPlausibleCard } from "./identifiers/card";
import { isValidRouting } from "./identifiers/routing";
import { BARE_NINE_DIGITS, GROUPED_SSN, isLabelledSsn, isValidSsn } from "./identifiers/ssn";

export type SensitiveKind = "ssn" | "routing" | "card";

export interface SensitiveMatch {
  kind: SensitiveKind;
  start: number;
  end: number;
  digits: string;
}

export interface SensitiveCounts {
  ssn: number;
  routing: number;
  card: number;
}

/**
 * Finds SSNs, ABA routing numbers and payment card numbers, each span counted once. Precedence:
 * 1. card numbers (13-19 digits) first; nothing inside a card span is looked at again;
 * 2. 3-2-4 grouped numbers (123-45-6789, 123 45 6789) are SSNs when SSA-valid, never routing
 *    numbers, which are not written that way;
 * 3. a bare nine-digit run is an SSN only right after an SSN label and when SSA-valid; otherwise
 *    it is a routing number when it passes the ABA prefix and 3-7-1 checksum; otherwise nothing.
 */
export function findSensitive(text: string): SensitiveMatch[] {
  const matches: SensitiveMatch[] = [];
  const taken = (start: number, end: number) => matches.some((m) => start < m.end && m.start < end);

  for (const match of text.matchAll(CARD_PATTERN)) {
    const card = trimToCard(match[0]);
    if (card) matches.push({ kind: "card", start: match.index, end: match.index + card.length, digits: onlyDigits(card) });
  }
  for (const match of text.matchAll(GROUPED_SSN)) {
    const end = match.index + match[0].length;
    const digits = onlyDigits(match[0]);
    if (isValidSsn(digits) && !taken(match.index, end)) matches.push({ kind: "ssn", start: match.index, end, digits });
  }
  for (const match of text.matchAll(BARE_NINE_DIGITS)) {
    const [start, end, digits] = [match.index, match.index + 9, match[0]];
    if (taken(start, end)) continue;
    if (isLabelledSsn(text, start) && isValidSsn(digits)) matches.push({ kind: "ssn", start, end, digits });
    else if (isValidRouting(digits)) matches.push({ kind: "routing", start, end, digits });
  }
  return matches.sort((a, b) => a.start - b.start);
}

/** Replaces every digit but the last four of each identifier with "*", keeping separators. */
export function maskSensitive(text: string): string {
  let masked = "";
  let cursor = 0;
  for (const match of findSensitive(text)) {
    masked += text.slice(cursor, match.start) + maskDigits(text.slice(match.start, match.end));
    cursor = match.end;
  }
  return masked + text.slice(cursor);
}

/**
 * Distinct identifiers per kind: a statement that repeats one account's routing number on every
 * page holds one routing number, and a payroll register with 30 employees holds 30 SSNs.
 */
export function countSensitive(text: string): SensitiveCounts {
  const seen: Record<SensitiveKind, Set<string>> = { ssn: new Set(), routing: new Set(), card: new Set() };
  for (const match of findSensitive(text)) seen[match.kind].add(match.digits);
  return { ssn: seen.ssn.size, routing: seen.routing.size, card: seen.card.size };
}

// "4111 1111 1111 1111 12" may be a card followed by a quantity: drop a grouped tail that breaks
// the check before giving up on the number.
function trimToCard(written: string): string | null {
  if (isPlausibleCard(onlyDigits(written))) return written;
  const withoutTail = written.replace(/[ -]\d{1,3}$/, "");
  return withoutTail !== written && isPlausibleCard(onlyDigits(withoutTail)) ? withoutTail : null;
}

function maskDigits(span: string): string {
  let digitsLeft = onlyDigits(span).length;
  return span.replace(/\d/g, (digit) => (digitsLeft-- > 4 ? "*" : digit));
}

function onlyDigits(text: string): string {
  return text.replace(/\D/g, "");
}
