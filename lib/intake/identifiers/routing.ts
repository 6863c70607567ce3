// ABA routing transit numbers: nine digits, the last a check digit.
// Checksum: 3(d1+d4+d7) + 7(d2+d5+d8) + (d3+d6+d9) ≡ 0 (mod 10), the "3-7-1" weights of the
// American Bankers Association's routing number scheme. The first two digits must be 00-12
// (00 U.S. Government, 01-12 the twelve Federal Reserve districts), 21-32 (thrift institutions),
// 61-72 (electronic transactions) or 80 (traveler's cheques). Both rules as summarised in the
// Wikipedia article "ABA routing transit number" and used by the Federal Reserve's check and ACH
// processing; the ABA's own list of assigned numbers (the "Key to Routing Numbers") is not
// public, so a number passing both rules may still be unassigned.

const WEIGHTS = [3, 7, 1, 3, 7, 1, 3, 7, 1] as const;

export function isValidRoutingPrefix(digits: string): boolean {
  const prefix = Number(digits.slice(0, 2));
  return prefix <= 12 || (prefix >= 21 && prefix <= 32) || (prefix >= 61 && prefix <= 72) || prefix === 80;
}

export function passesAbaChecksum(digits: string): boolean {
  if (!/^\d{9}$/.test(digits)) return false;
  const sum = WEIGHTS.reduce((total, weight, i) => total + weight * Number(digits[i]), 0);
  return sum % 10 === 0;
}

export function isValidRouting(digits: string): boolean {
  return passesAbaChecksum(digits) && isValidRoutingPrefix(digits);
}
