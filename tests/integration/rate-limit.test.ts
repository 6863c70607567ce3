import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { env } from "@/lib/env";
import { RateLimited } from "@/lib/errors";
import { toErrorResponse } from "@/lib/http";
import { countHits, enforceRateLimit, limitLinkAttempt, limitResetRequest, RATE_RULES } from "@/lib/data/rate-limit";
import { ownerDb } from "../helpers/db";

// The limits kept in MariaDB (issue 13). Client addresses from TEST-NET-2 (RFC 5737).
const owner = ownerDb();
beforeEach(async () => {
  await owner("rate_limits").delete();
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

async function refusedAt(attempt: () => Promise<void>, tries: number): Promise<number | null> {
  for (let i = 1; i <= tries; i++) {
    const e = await attempt().then(() => null, (err) => err);
    if (e) {
      expect(e).toBeInstanceOf(RateLimited);
      return i;
    }
  }
  return null;
}

describe("rate limits", () => {
  it("forgot password: the same address asked for too often is 429 with Retry-After, known or not alike", async () => {
    const max = env.limits.resetRequestsPerAccount;
    expect(await refusedAt(() => limitResetRequest("nobody@example.com", "198.51.100.1"), max + 1)).toBe(max + 1);
    expect(await refusedAt(() => limitResetRequest("clerk@example.com", "198.51.100.2"), max + 1)).toBe(max + 1);
    const e = await limitResetRequest("Nobody@Example.com ", "198.51.100.3").catch((err) => err);
    const res = toErrorResponse(e);
    expect(res.status).toBe(429);
    expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
    expect((await res.json()).error.message).toMatch(/^Too many password-reset requests for this address\. Wait \d+ minutes? and try again/);
  });

  it("a one-time link is limited per link and per client address", async () => {
    const perLink = env.limits.attemptsPerLink;
    expect(await refusedAt(() => limitLinkAttempt("a".repeat(43), "198.51.100.4"), perLink + 1)).toBe(perLink + 1);
    // Earlier attempts from this address, seeded to keep the test short; then the last few for real.
    await owner("rate_limits").insert({ rule: "link_address", subject: "198.51.100.5", hits: env.limits.linkAttemptsPerAddress - 3, window_ends_at: new Date(Date.now() + 10 * 60_000) });
    expect(await refusedAt(() => limitLinkAttempt(`link-${Math.random()}`, "198.51.100.5"), 4)).toBe(4);
  });

  it("uploads per person per minute are bounded, and each person counts alone", async () => {
    const rule = { ...RATE_RULES.uploads(), max: 5 };
    expect(await refusedAt(() => enforceRateLimit(rule, "17"), 6)).toBe(6);
    await expect(enforceRateLimit(rule, "18")).resolves.toBeUndefined();
  });

  it("counts are exact under a parallel burst, and a window that ended starts again at one", async () => {
    const rule = { name: "test_burst", max: 1000, windowSeconds: 1, what: "tests" };
    const counts = await Promise.all(Array.from({ length: 25 }, () => countHits(rule, "s").then((c) => c.hits)));
    expect([...counts].sort((a, b) => a - b)).toEqual(Array.from({ length: 25 }, (_, i) => i + 1));
    await owner("rate_limits").where({ rule: "test_burst" }).update({ window_ends_at: new Date(Date.now() - 1000) });
    expect((await countHits(rule, "s")).hits).toBe(1);
  });
});
