import { describe, expect, it } from "vitest";
import { clientAddressFrom } from "@/lib/net/client-address";

// X-Forwarded-For: each proxy appends the address it received the request from (MDN's
// X-Forwarded-For page, from memory), so only the entries the trusted proxies wrote can be
// believed; a client may send any value of its own.
describe("the client address for rate limits", () => {
  it("with no trusted proxy it is the connection's address, whatever X-Forwarded-For says", () => {
    expect(clientAddressFrom("::ffff:192.0.2.1", "203.0.113.9", 0)).toBe("192.0.2.1");
    expect(clientAddressFrom("192.0.2.1", undefined, 0)).toBe("192.0.2.1");
  });
  it("behind one proxy it is the last entry, behind two the one before", () => {
    expect(clientAddressFrom("10.0.0.1", "6.6.6.6, 198.51.100.7", 1)).toBe("198.51.100.7");
    expect(clientAddressFrom("10.0.0.1", "6.6.6.6, 198.51.100.7, 10.0.0.2", 2)).toBe("198.51.100.7");
  });
  it("falls back to the connection when the header is missing", () => {
    expect(clientAddressFrom("10.0.0.1", undefined, 1)).toBe("10.0.0.1");
  });
});
