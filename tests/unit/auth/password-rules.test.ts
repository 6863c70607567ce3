import fs from "node:fs";
import { createRequire } from "node:module";
import { describe, expect, it } from "vitest";
import { checkPassword, commonPasswords, PASSWORD_MIN_LENGTH } from "@/lib/auth/password-rules";
import { hashToken, newToken } from "@/lib/auth/tokens";

const require = createRequire(import.meta.url);

describe("password rules", () => {
  it("the shipped list is the source's passwords of the minimum length or more, in its order", () => {
    // Source: @zxcvbn-ts/language-common 4.1.3, dictionary "passwords-common" (MIT), ranked most common first.
    const source: string[] = require("@zxcvbn-ts/language-common").dictionary["passwords-common"];
    const expected = [...new Set(source.filter((p) => p.length >= PASSWORD_MIN_LENGTH).map((p) => p.toLowerCase()))];
    const shipped = fs.readFileSync("lib/auth/common-passwords.txt", "utf8").split("\n").filter((l) => l && !l.startsWith("#"));
    expect(shipped).toEqual(expected);
    expect(commonPasswords().size).toBe(expected.length);
  });

  it("refuses short, e-mail-like and common passwords with a sentence, and accepts a passphrase", () => {
    expect(checkPassword("short1", "a@example.com")).toMatch(/^This password is too short\. Use at least 10 characters/);
    // NIST SP 800-63B §5.1.1.2 asks for a check against commonly used passwords; these two lead the source list.
    expect(checkPassword("qwertyuiop", "a@example.com")).toMatch(/commonly used/);
    expect(checkPassword("1234567890", "a@example.com")).toMatch(/commonly used/);
    expect(checkPassword("QwertyUiop", "a@example.com")).toMatch(/commonly used/); // case does not hide it
    expect(checkPassword("tamsin.reyes-2026", "tamsin.reyes@example.com")).toMatch(/contains your e-mail/);
    expect(checkPassword("x".repeat(73), "a@example.com")).toMatch(/longer than 72 bytes/);
    // 63 characters but 95 bytes in UTF-8 (each of ü ï ö é is 2 bytes): the limit counts bytes.
    expect(checkPassword(Array(8).fill("ünïcödé").join(" "), "a@example.com")).toMatch(/longer than 72 bytes/);
    expect(checkPassword("quiet harbour lanterns", "a@example.com")).toBeNull();
  });
});

describe("one-time link tokens", () => {
  it("are 256-bit base64url and stored as their SHA-256", () => {
    const { token, hash } = newToken();
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(hash).toBe(hashToken(token));
    // FIPS 180-2 Appendix B.1 worked example: SHA-256("abc").
    expect(hashToken("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    expect(newToken().token).not.toBe(token);
  });
});
