// Payment card numbers (PANs): 13-19 digits whose last digit is a Luhn check digit, as ISO/IEC
// 7812-1 specifies. The Luhn rule: from the rightmost digit (the check digit) leftwards, double
// every second digit, subtract 9 from any result above 9, and the total must be a multiple of 10.
// Random digit strings pass one time in ten, so we also want a plausible first digit: the major
// industry identifier (ISO/IEC 7812-1's first digit; the table from memory, the standard is
// paywalled) is 2 (airlines, and Mastercard's 2-series), 3 (travel and entertainment: Amex,
// Diners, JCB), 4-5 (banking and financial: Visa, Mastercard) or 6 (merchandising and banking:
// Discover, UnionPay, Maestro). Other first digits are not payment cards a client would send.

/**
 * How card numbers are written: 16 in fours (optionally a 1-3 digit tail for 17-19), Amex 4-6-5,
 * Diners 4-6-4, or 13-19 digits in a row. One separator kind per number, so an SSN next to a
 * date is not stitched into a "card".
 */
export const CARD_PATTERN = new RegExp(
  [
    String.raw`(?<![\d-])\d{4}([ -])\d{4}\1\d{4}\1\d{4}(?:\1\d{1,3})?(?![\d])`,
    String.raw`(?<![\d-])\d{4}([ -])\d{6}\2\d{4,5}(?![\d])`,
    String.raw`(?<!\d)\d{13,19}(?!\d)`,
  ].join("|"),
  "g",
);

export function passesLuhn(digits: string): boolean {
  if (!/^\d+$/.test(digits)) return false;
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    let digit = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      digit *= 2;
      if (digit > 9) digit -= 9;
    }
    sum += digit;
  }
  return sum % 10 === 0;
}

export function isPlausibleCard(digits: string): boolean {
  return digits.length >= 13 && digits.length <= 19 && /^[2-6]/.test(digits) && passesLuhn(digits);
}
