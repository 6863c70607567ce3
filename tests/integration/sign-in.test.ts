import { afterAll, beforeEach, describe, expect, it, vi } from "vitest";
import { checkCredentials } from "@/lib/data/users";
import { RateLimited } from "@/lib/errors";
import { toErrorResponse } from "@/lib/http";
import { closeDb } from "@/db";
import { env } from "@/lib/env";
import { ownerDb } from "../helpers/db";

// Credential checks against the seeded demo accounts in the test database. Client addresses
// are from TEST-NET-1 and TEST-NET-3 (RFC 5737, reserved for documentation).
const owner = ownerDb();
const ADDRESS = "192.0.2.10";

// Every hash check goes through verifyPassword: counting its calls counts the guesses checked.
const hashChecks = vi.hoisted(() => ({ count: 0 }));
vi.mock("@/lib/auth/password", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/auth/password")>();
  return {
    ...real,
    verifyPassword: async (password: string, hash: string) => {
      hashChecks.count++;
      return real.verifyPassword(password, hash);
    },
  };
});

async function seedHits(rule: string, subject: string, hits: number) {
  await owner("rate_limits").insert({ rule, subject, hits, window_ends_at: new Date(Date.now() + 10 * 60_000) });
}

describe("credential checks", () => {
  beforeEach(async () => {
    await owner("users").update({ failed_sign_ins: 0, locked_until: null });
    await owner("rate_limits").delete();
  });
  afterAll(async () => {
    await owner("users").update({ failed_sign_ins: 0, locked_until: null });
    await owner.destroy();
    await closeDb();
  });

  it("accepts the right password and ignores the e-mail's case", async () => {
    const r = await checkCredentials("Clerk@Example.com", env.demoPassword, ADDRESS);
    expect(r).toMatchObject({ ok: true, user: { email: "clerk@example.com", role: "clerk" } });
  });

  it("rejects a wrong password with the same words as an unknown user", async () => {
    const wrong = await checkCredentials("clerk@example.com", "not-the-password", ADDRESS);
    const unknown = await checkCredentials("nobody@example.com", env.demoPassword, ADDRESS);
    expect(wrong).toMatchObject({ ok: false, code: "wrong_credentials" });
    expect(unknown).toMatchObject({ ok: false, code: "wrong_credentials" });
    expect(!wrong.ok && !unknown.ok && wrong.message === unknown.message).toBe(true);
  });

  it(`locks the account after ${env.signIn.maxFailures} wrong passwords, even against the right one`, async () => {
    for (let i = 1; i < env.signIn.maxFailures; i++) {
      expect(await checkCredentials("partner@example.com", "wrong", ADDRESS)).toMatchObject({ code: "wrong_credentials" });
    }
    const locked = await checkCredentials("partner@example.com", "wrong", ADDRESS);
    expect(locked).toMatchObject({ ok: false, code: "account_locked" });
    expect(!locked.ok && locked.message).toMatch(/locked after \d+ wrong passwords/);
    expect(await checkCredentials("partner@example.com", env.demoPassword, ADDRESS)).toMatchObject({ code: "account_locked" });

    // When the lock has run out, the right password works again and the counter is reset.
    await owner("users").where({ email: "partner@example.com" }).update({ locked_until: new Date(Date.now() - 1000) });
    expect(await checkCredentials("partner@example.com", env.demoPassword, ADDRESS)).toMatchObject({ ok: true });
    expect((await owner("users").where({ email: "partner@example.com" }).first()).failed_sign_ins).toBe(0);
  });

  it("refuses a deactivated account", async () => {
    await owner("users").where({ email: "auditor@example.com" }).update({ active: false });
    try {
      expect(await checkCredentials("auditor@example.com", env.demoPassword, ADDRESS)).toMatchObject({ ok: false });
    } finally {
      await owner("users").where({ email: "auditor@example.com" }).update({ active: true });
    }
  });

  it(`a burst of 30 parallel wrong passwords checks exactly ${env.signIn.maxFailures} against the hash`, async () => {
    hashChecks.count = 0;
    const answers = await Promise.all(Array.from({ length: 30 }, (_, i) => checkCredentials("clerk@example.com", `wrong-${i}`, ADDRESS)));
    expect(hashChecks.count).toBe(env.signIn.maxFailures);
    expect(answers.filter((a) => !a.ok && a.code === "wrong_credentials")).toHaveLength(env.signIn.maxFailures - 1);
    expect(answers.filter((a) => !a.ok && a.code === "account_locked")).toHaveLength(30 - (env.signIn.maxFailures - 1));
    expect(answers.some((a) => a.ok)).toBe(false);
    // The account is locked with the counter ready for after the lock.
    const row = await owner("users").where({ email: "clerk@example.com" }).first("failed_sign_ins", "locked_until");
    expect(new Date(row.locked_until).getTime()).toBeGreaterThan(Date.now());
    expect(row.failed_sign_ins).toBe(0);
  });

  it(`wrong sign-ins over many accounts from one address get 429 after ${env.signIn.addressMaxFailures}, with Retry-After; other addresses are not affected`, async () => {
    const address = "203.0.113.7";
    const n = env.signIn.addressMaxFailures;
    await seedHits("sign_in_address", address, n - 5); // earlier wrong sign-ins from this address, to keep the test short
    for (let i = 0; i < 5; i++) {
      expect(await checkCredentials(`nobody-${i}@example.com`, "wrong", address)).toMatchObject({ code: "wrong_credentials" });
    }
    const refused = await checkCredentials("nobody-last@example.com", "wrong", address).catch((e) => e);
    expect(refused).toBeInstanceOf(RateLimited);
    const res = toErrorResponse(refused);
    expect(res.status).toBe(429);
    expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(Number(res.headers.get("retry-after"))).toBeLessThanOrEqual(env.signIn.lockMinutes * 60 + 1);
    expect((await res.json()).error.message).toMatch(/^Too many wrong sign-ins from your network\. Wait \d+ minutes? and try again/);
    // Even the right password waits: the address is limited, not the account.
    await expect(checkCredentials("admin@example.com", env.demoPassword, address)).rejects.toBeInstanceOf(RateLimited);
    expect(await checkCredentials("admin@example.com", env.demoPassword, "203.0.113.8")).toMatchObject({ ok: true });
  });

  it("the per-address count is atomic too: a parallel burst over many accounts lets exactly the limit through", async () => {
    const address = "203.0.113.9";
    const n = env.signIn.addressMaxFailures;
    await seedHits("sign_in_address", address, n - 5);
    const answers = await Promise.all(
      Array.from({ length: 20 }, (_, i) => checkCredentials(`burst-${i}@example.com`, "wrong", address).then(() => "checked", (e) => (e instanceof RateLimited ? "429" : String(e)))),
    );
    expect(answers.filter((a) => a === "checked")).toHaveLength(5);
    expect(answers.filter((a) => a === "429")).toHaveLength(15);
  });

  it("a right password gives its address hit back", async () => {
    const address = "203.0.113.10";
    await seedHits("sign_in_address", address, env.signIn.addressMaxFailures - 1);
    for (let i = 0; i < 5; i++) {
      expect(await checkCredentials("clerk@example.com", env.demoPassword, address)).toMatchObject({ ok: true });
    }
  });
});
