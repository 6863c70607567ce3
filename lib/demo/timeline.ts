// When the demo office's documents came in: one every few hours, oldest first, the newest an
// hour before the seed ran, so no date on any screen lies in the future.
const HOUR = 3_600_000;
/** Six documents a day (a small office's steady trickle). */
export const DEMO_ARRIVAL_GAP_MS = 4 * HOUR;
/** The newest demo document arrived this long before the seed ran. */
export const DEMO_NEWEST_AGE_MS = HOUR;

/** Upload time of the i-th of `count` demo documents (i from 0, oldest first). */
export function demoUploadTime(i: number, count: number, now: number): Date {
  return new Date(now - (count - 1 - i) * DEMO_ARRIVAL_GAP_MS - DEMO_NEWEST_AGE_MS);
}

/** A filed demo document was filed half an hour after it came in (never after `now`). */
export function demoFilingTime(uploadedAt: Date, now: number): Date {
  return new Date(Math.min(uploadedAt.getTime() + HOUR / 2, now));
}
