// U.S. Social Security numbers, AAA-GG-SSSS (area, group, serial).
// Validity rules from the Social Security Administration, "SSN Randomization" FAQ
// (https://www.ssa.gov/employer/randomizationfaqs.html): since 25 June 2011 numbers are assigned
// at random, excluding area numbers 000, 666 and 900-999; group 00 and serial 0000 are never
// assigned. 900-999 is where IRS Individual Taxpayer Identification Numbers (ITINs) live, so
// those are not counted as SSNs. There is no check digit.

/** Written with dashes or spaces, the same separator twice: 123-45-6789, 123 45 6789. */
export const GROUPED_SSN = /(?<![\d-])(\d{3})([- ])(\d{2})\2(\d{4})(?![\d-])/g;

/** Nine digits in a row, counted as an SSN only when labelled (see `isLabelledSsn`). */
export const BARE_NINE_DIGITS = /(?<!\d)\d{9}(?!\d)/g;

// A bare nine-digit run is as likely an invoice, policy or routing number as an SSN, so it counts
// only right after a label such as "SSN", "SS#" or "Social Security No.".
const SSN_LABEL = /\b(?:SSN|SS#|S\.S\.N\.?|social\s+security(?:\s+(?:no\.?|number|#))?)\s*[:#]?\s*$/i;
const LABEL_WINDOW = 30;

export function isValidSsn(digits: string): boolean {
  if (!/^\d{9}$/.test(digits)) return false;
  const area = Number(digits.slice(0, 3));
  const group = digits.slice(3, 5);
  const serial = digits.slice(5);
  if (area === 0 || area === 666 || area >= 900) return false;
  return group !== "00" && serial !== "0000";
}

export function isLabelledSsn(text: string, start: number): boolean {
  return SSN_LABEL.test(text.slice(Math.max(0, start - LABEL_WINDOW), start));
}
