import { describe, expect, it } from "vitest";
import { isPlausibleCard, passesLuhn } from "@/lib/intake/identifiers/card";
import { isValidRouting, passesAbaChecksum } from "@/lib/intake/identifiers/routing";
import { isValidSsn } from "@/lib/intake/identifiers/ssn";
import { countSensitive, findSensitive, maskSensitive } from "@/lib/intake/sensitive";

const kinds = (text: string) => findSensitive(text).map((m) => `${m.kind}:${m.digits}`);

describe("SSNs, by the SSA's randomization rules (ssa.gov/employer/randomizationfaqs.html)", () => {
  it("accepts a number with a valid area, group and serial, written 3-2-4 with dashes or spaces", () => {
    expect(kinds("Employee SSN 123-45-6789 on file")).toEqual(["ssn:123456789"]);
    expect(kinds("SSN 123 45 6789")).toEqual(["ssn:123456789"]);
  });

  it("rejects area 000, 666 and 900-999 (900-999 are ITINs), group 00 and serial 0000", () => {
    for (const invalid of ["000123456", "666123456", "900123456", "999123456", "123004567", "123450000"]) {
      expect(isValidSsn(invalid)).toBe(false);
    }
    // The edges of the refused ranges stay valid.
    for (const valid of ["001010001", "665123456", "667123456", "899123456"]) expect(isValidSsn(valid)).toBe(true);
    expect(kinds("666-12-3456 and 912-34-5678 and 123-00-4567 and 123-45-0000")).toEqual([]);
  });

  it("needs the same separator twice and no digits around it", () => {
    expect(kinds("123-45 6789, 1123-45-6789, 123-45-67890")).toEqual([]);
  });

  it("counts a bare nine-digit run as an SSN only right after an SSN label", () => {
    expect(kinds("Social Security No.: 123456789")).toEqual(["ssn:123456789"]);
    expect(kinds("SS# 123456789")).toEqual(["ssn:123456789"]);
    expect(kinds("Invoice 123456789")).toEqual([]); // fails the ABA checksum too, so nothing
  });
});

describe("ABA routing numbers: prefix 00-12, 21-32, 61-72 or 80, and the 3-7-1 checksum", () => {
  it("accepts worked examples", () => {
    // 011000015, Federal Reserve Bank of Boston (from memory):
    // 3·(0+0+0) + 7·(1+0+1) + 1·(1+0+5) = 0 + 14 + 6 = 20 ≡ 0 (mod 10).
    expect(passesAbaChecksum("011000015")).toBe(true);
    // 111000025, Bank of America in Virginia: the worked example of Wikipedia's
    // "ABA routing transit number" article. 3·(1+0+0) + 7·(1+0+2) + 1·(1+0+5) = 3 + 21 + 6 = 30.
    expect(isValidRouting("111000025")).toBe(true);
    // 021000021, JPMorgan Chase in New York (from memory): 7·(2+0+2) + 1·(1+0+1) = 30.
    expect(isValidRouting("021000021")).toBe(true);
  });

  it("rejects a wrong check digit and prefixes outside the assigned ranges", () => {
    expect(isValidRouting("011000016")).toBe(false); // checksum 21
    expect(passesAbaChecksum("130000006")).toBe(true); // checksum 30, but prefix 13 is unassigned
    expect(isValidRouting("130000006")).toBe(false);
    expect(isValidRouting("500000005")).toBe(false); // prefix 50 likewise
  });

  it("finds a routing number in running text", () => {
    expect(kinds("Wire to routing 011000015, account 000123456789")).toEqual(["routing:011000015"]);
  });
});

describe("payment card numbers: 13-19 digits, Luhn check (ISO/IEC 7812-1), first digit 2-6", () => {
  it("passes the Luhn worked example 79927398713 (Wikipedia, 'Luhn algorithm')", () => {
    expect(passesLuhn("79927398713")).toBe(true);
    expect(passesLuhn("79927398710")).toBe(false);
    expect(kinds("ref 79927398713")).toEqual([]); // 11 digits: too short for a card
  });

  it("catches every single-digit change of the Visa test number 4111 1111 1111 1111", () => {
    // 4111 1111 1111 1111 is the Visa test number in card processors' sandbox docs (from memory).
    expect(passesLuhn("4111111111111111")).toBe(true);
    for (let position = 0; position < 16; position += 1) {
      for (let digit = 0; digit <= 9; digit += 1) {
        const changed = `${"4111111111111111".slice(0, position)}${digit}${"4111111111111111".slice(position + 1)}`;
        if (changed !== "4111111111111111") expect(passesLuhn(changed)).toBe(false);
      }
    }
  });

  it("finds cards written in fours, Amex 4-6-5 and unbroken, and skips implausible ones", () => {
    expect(kinds("Visa 4111 1111 1111 1111; MC 5555-5555-5555-4444; Amex 3782 822463 10005")).toEqual([
      "card:4111111111111111",
      "card:5555555555554444",
      "card:378282246310005", // Mastercard and Amex test numbers (from memory)
    ]);
    expect(kinds("card 4111111111111111")).toEqual(["card:4111111111111111"]);
    expect(kinds("4111 1111 1111 1112")).toEqual([]); // fails Luhn
    expect(isPlausibleCard("9111111111111110")).toBe(false); // passes Luhn, but 9 is no card network
    expect(kinds("4111 1111-1111 1111")).toEqual([]); // mixed separators
  });

  it("keeps a card followed by a small number apart from it", () => {
    expect(maskSensitive("Card 4111 1111 1111 1111 12 items")).toBe("Card **** **** **** 1111 12 items");
  });
});

describe("precedence between SSNs and routing numbers (121042882 is SSA-valid and ABA-valid)", () => {
  it("reads a bare unlabelled run as a routing number, a labelled or 3-2-4 one as an SSN", () => {
    // 121042882: area 121, group 04, serial 2882; 3·(1+0+8) + 7·(2+4+8) + 1·(1+2+2) = 27 + 98 + 5 = 130.
    expect(kinds("ABA 121042882")).toEqual(["routing:121042882"]);
    expect(kinds("SSN: 121042882")).toEqual(["ssn:121042882"]);
    expect(kinds("121-04-2882")).toEqual(["ssn:121042882"]);
  });

  it("never counts one span twice", () => {
    const matches = findSensitive("SSN: 121042882 then 4111 1111 1111 1111 then 011000015");
    expect(matches.map((m) => m.kind)).toEqual(["ssn", "card", "routing"]);
  });
});

describe("maskSensitive and countSensitive", () => {
  it("masks all but the last four digits and keeps the separators", () => {
    expect(maskSensitive("SSN 123-45-6789, routing 011000015, card 4111 1111 1111 1111.")).toBe(
      "SSN ***-**-6789, routing *****0015, card **** **** **** 1111.",
    );
    expect(maskSensitive("SSN 123 45 6789")).toBe("SSN *** ** 6789");
    expect(maskSensitive("No identifiers here, only 2026-04-14 and 555-0100.")).toBe(
      "No identifiers here, only 2026-04-14 and 555-0100.",
    );
  });

  it("counts distinct numbers per kind", () => {
    const statement = [
      "Page 1 routing 011000015 SSN 123-45-6789",
      "Page 2 routing 011000015 SSN 234-56-7890",
      "Card 4111 1111 1111 1111 and again 4111-1111-1111-1111",
    ].join("\n");
    expect(countSensitive(statement)).toEqual({ ssn: 2, routing: 1, card: 1 });
    expect(countSensitive("")).toEqual({ ssn: 0, routing: 0, card: 0 });
  });
});
