// What a change to a retention rule or to a matter's closing date would do, before it is saved:
// each document's date before and after, compared. Pure, so Setup forms and tests share it.
import { isDue } from "./retention-date";

export interface DatePair {
  before: string | null;
  after: string | null;
}

export interface RetentionImpact {
  /** Documents the rule or the closing date applies to. */
  documents: number;
  /** Documents whose retention date would change (including gaining or losing one). */
  changed: number;
  /** Documents that would become due today (or were not due and would be past their date). */
  newlyDue: number;
  /** Documents due now that would no longer be due. */
  noLongerDue: number;
}

export function retentionImpact(pairs: DatePair[], today: string): RetentionImpact {
  let changed = 0;
  let newlyDue = 0;
  let noLongerDue = 0;
  for (const { before, after } of pairs) {
    if (before !== after) changed++;
    const [was, will] = [isDue(before, today), isDue(after, today)];
    if (!was && will) newlyDue++;
    if (was && !will) noLongerDue++;
  }
  return { documents: pairs.length, changed, newlyDue, noLongerDue };
}
