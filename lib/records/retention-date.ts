// When a filed document may be destroyed (DESIGN §8): its cabinet type's rule applied to the
// document's filing date or its matter's closing date.
//
//   after_filing        → filing date + N years
//   after_matter_close  → the matter's closing date + N years; none while the matter is open
//                         (a matter reopened after closing is open again: its old closing date
//                         no longer counts)
//   permanent           → none
//
// Calendar convention: "+ N years" keeps the month and day and, when that day does not exist in
// the target year (29 February), takes the last day of that month (28 February). That is what
// MariaDB's DATE_ADD(…, INTERVAL N YEAR) does, which the list filters use, so the date shown and
// the date filtered on always agree (tests/integration/retention.test.ts compares the two). Dates
// are calendar days "YYYY-MM-DD" in UTC, with no time of day, so no time zone can shift them.
// A small function of our own rather than a date library: the libraries work on instants in the
// process's local zone, where a calendar day is what the rule is about.

export type RetentionTrigger = "after_filing" | "after_matter_close" | "permanent";

export interface RetentionRule {
  years: number | null;
  trigger: RetentionTrigger;
}

export interface RetentionFacts {
  filedOn: string | null; // the UTC calendar day the document was filed, or null when not filed
  matterStatus: "open" | "closed" | null;
  matterClosedOn: string | null;
}

export type RetentionBasis = "not_filed" | "permanent" | "no_period" | "matter_open" | "matter_no_closing_date" | "after_filing" | "after_matter_close";

export interface RetentionDate {
  dueOn: string | null;
  basis: RetentionBasis;
}

/** Retention periods longer than this are a typing mistake, not a rule (a century). */
export const RETENTION_YEARS_MAX = 100;
/** "Due within 90 days" in Cabinets: about one quarter's notice before a record falls due. */
export const DUE_SOON_DAYS = 90;

const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate(); // day 0 of the next month
}

function parseDay(day: string): [number, number, number] {
  const m = ISO_DAY.exec(day);
  if (!m) throw new Error(`"${day}" is not a calendar date (YYYY-MM-DD).`);
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (mo < 1 || mo > 12 || d < 1 || d > daysInMonth(y, mo)) throw new Error(`"${day}" is not a calendar date (YYYY-MM-DD).`);
  return [y, mo, d];
}

const pad = (n: number, w = 2) => String(n).padStart(w, "0");

/** day + years, with 29 February becoming 28 February in a common year. */
export function addYears(day: string, years: number): string {
  if (!Number.isInteger(years) || years < 0) throw new Error(`A retention period is a whole number of years from 0, not ${years}.`);
  const [y, m, d] = parseDay(day);
  const year = y + years;
  return `${pad(year, 4)}-${pad(m)}-${pad(Math.min(d, daysInMonth(year, m)))}`;
}

/** day + days (for "due within 90 days"). */
export function addDays(day: string, days: number): string {
  const [y, m, d] = parseDay(day);
  return new Date(Date.UTC(y, m - 1, d + days)).toISOString().slice(0, 10);
}

/** The UTC calendar day of an instant. */
export function utcDay(at: Date | string): string {
  return new Date(at).toISOString().slice(0, 10);
}

export function retentionDate(rule: RetentionRule, facts: RetentionFacts): RetentionDate {
  if (!facts.filedOn) return { dueOn: null, basis: "not_filed" };
  if (rule.trigger === "permanent") return { dueOn: null, basis: "permanent" };
  if (rule.years === null) return { dueOn: null, basis: "no_period" };
  if (rule.trigger === "after_filing") return { dueOn: addYears(facts.filedOn, rule.years), basis: "after_filing" };
  if (facts.matterStatus !== "closed") return { dueOn: null, basis: "matter_open" };
  if (!facts.matterClosedOn) return { dueOn: null, basis: "matter_no_closing_date" };
  return { dueOn: addYears(facts.matterClosedOn, rule.years), basis: "after_matter_close" };
}

/** Due means the retention date is today or earlier: zero years makes a record due on its filing day. */
export function isDue(dueOn: string | null, today: string): boolean {
  return dueOn !== null && dueOn <= today;
}

export type RetentionStanding = "past_due" | "due_soon" | "later" | "none";

export function retentionStanding(dueOn: string | null, today: string, soonDays = DUE_SOON_DAYS): RetentionStanding {
  if (dueOn === null) return "none";
  if (dueOn <= today) return "past_due";
  return dueOn <= addDays(today, soonDays) ? "due_soon" : "later";
}

/** The rule in words, for screens and the certificate. */
export function describeRule(rule: RetentionRule): string {
  if (rule.trigger === "permanent") return "Kept permanently";
  if (rule.years === null) return "No retention period set";
  const years = `${rule.years} ${rule.years === 1 ? "year" : "years"}`;
  return rule.trigger === "after_filing" ? `${years} after filing` : `${years} after the matter closes`;
}

/** Why a document has no date, in words. */
export const NO_DATE_WORDS: Record<Exclude<RetentionBasis, "after_filing" | "after_matter_close">, string> = {
  not_filed: "Not filed yet: no retention date.",
  permanent: "Kept permanently: no retention date.",
  no_period: "The cabinet type sets no retention period.",
  matter_open: "No date while the matter is open; it starts when the matter closes.",
  matter_no_closing_date: "The matter is closed but has no closing date; set one in Setup.",
};
