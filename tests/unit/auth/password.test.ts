import { describe, expect, it } from "vitest";
import bcrypt from "bcryptjs";
import { hashPassword, verifyPassword } from "@/lib/auth/password";

// Source: the test vectors of Openwall's crypt_blowfish (the reference bcrypt implementation,
// wrapper.c `tests[]`), also used by OpenBSD and the jBCrypt/bcrypt.js test suites.
const OPENWALL_VECTORS: [password: string, hash: string][] = [
  ["U*U", "$2a$05$CCCCCCCCCCCCCCCCCCCCC.E5YPO9kmyuRGyh0XouQYb4YMJKvyOeW"],
  ["U*U*", "$2a$05$CCCCCCCCCCCCCCCCCCCCC.VGOzA784oUp/Z0DY336zx7pLYAy0lwK"],
  ["U*U*U", "$2a$05$XXXXXXXXXXXXXXXXXXXXXOAcXxm9kjPGEMsLznoKqmqw7tc8WCx4a"],
  ["", "$2a$05$CCCCCCCCCCCCCCCCCCCCC.7uG0VCzI2bS7j6ymqJi9CdcdxiRTWNy"],
  [
    "0123456789abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789chars after 72 are ignored",
    "$2a$05$abcdefghijklmnopqrstuu5s2v8.iXieOjg/.AySBTTZIIVFJeBui",
  ],
];

describe("password hashing (bcrypt)", () => {
  it.each(OPENWALL_VECTORS)("verifies the crypt_blowfish vector for %j", async (password, hash) => {
    expect(await verifyPassword(password, hash)).toBe(true);
    // A changed first character must fail (characters past 72 bytes are ignored by design).
    expect(await verifyPassword(`x${password}`, hash)).toBe(false);
  });

  it.each(OPENWALL_VECTORS)("recomputes the crypt_blowfish vector for %j from its salt", (password, hash) => {
    expect(bcrypt.hashSync(password, hash.slice(0, 29))).toBe(hash);
  });

  it("hashes with a fresh salt each time and verifies its own hashes", async () => {
    const a = await hashPassword("foldwright-demo", 4);
    const b = await hashPassword("foldwright-demo", 4);
    expect(a).toMatch(/^\$2b\$04\$[./A-Za-z0-9]{53}$/);
    expect(a).not.toBe(b);
    expect(await verifyPassword("foldwright-demo", a)).toBe(true);
    expect(await verifyPassword("foldwright-demo!", a)).toBe(false);
  });
});
