import { describe, expect, it } from "vitest";
import { sha256Hex } from "@/lib/intake/hash";

describe("sha256Hex", () => {
  // Test vectors from NIST FIPS 180-2, Appendix B.1 ("abc") and the well-known empty-input digest.
  it("matches the published SHA-256 test vectors", () => {
    expect(sha256Hex(new TextEncoder().encode("abc"))).toBe(
      "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
    );
    expect(sha256Hex(new Uint8Array(0))).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
  });

  it("hashes only the bytes of a view, not the whole buffer behind it", () => {
    const whole = new TextEncoder().encode("xxabcxx");
    expect(sha256Hex(whole.subarray(2, 5))).toBe(sha256Hex(new TextEncoder().encode("abc")));
  });
});
