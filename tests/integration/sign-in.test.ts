import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { checkCredentials } from "@/lib/data/users";
import { closeDb } from "@/db";
import { env } from "@/lib/env";
import { ownerDb } from "../helpers/db";

// Credential checks against the seeded demo accounts in the test database.
const owner = ownerDb();

describe("credential checks", () => {
  beforeEach(async () => {
    await owner("users").update({ failed_sign_ins: 0, locked_until: null });
  });
  afterAll(async () => {
    await owner("users").update({ failed_sign_ins: 0, locked_until: null });
    await owner.destroy();
    await closeDb();
  });

  it("accepts the right password and ignores the e-mail's case", async () => {
    const r = await checkCredentials("Clerk@Example.com", env.demoPassword);
    expect(r).toMatchObject({ ok: true, user: { email: "clerk@example.com", role: "clerk" } });
  });

  it("rejects a wrong password with the same words as an unknown user", async () => {
    const wrong = await checkCredentials("clerk@example.com", "not-the-password");
    const unknown = await checkCredentials("nobody@example.com", env.demoPassword);
    expect(wrong).toMatchObject({ ok: false, code: "wrong_credentials" });
    expect(unknown).toMatchObject({ ok: false, code: "wrong_credentials" });
    expect(!wrong.ok && !unknown.ok && wrong.message === unknown.message).toBe(true);
  });

  it(`locks the account after ${env.signIn.maxFailures} wrong passwords, even against the right one`, async () => {
    for (let i = 1; i < env.signIn.maxFailures; i++) {
      expect(await checkCredentials("partner@example.com", "wrong")).toMatchObject({ code: "wrong_credentials" });
    }
    const locked = await checkCredentials("partner@example.com", "wrong");
    expect(locked).toMatchObject({ ok: false, code: "account_locked" });
    expect(!locked.ok && locked.message).toMatch(/locked after \d+ wrong passwords/);
    expect(await checkCredentials("partner@example.com", env.demoPassword)).toMatchObject({ code: "account_locked" });

    // When the lock has run out, the right password works again and the counter is reset.
    await owner("users").where({ email: "partner@example.com" }).update({ locked_until: new Date(Date.now() - 1000) });
    expect(await checkCredentials("partner@example.com", env.demoPassword)).toMatchObject({ ok: true });
    expect((await owner("users").where({ email: "partner@example.com" }).first()).failed_sign_ins).toBe(0);
  });

  it("refuses a deactivated account", async () => {
    await owner("users").where({ email: "auditor@example.com" }).update({ active: false });
    try {
      expect(await checkCredentials("auditor@example.com", env.demoPassword)).toMatchObject({ ok: false });
    } finally {
      await owner("users").where({ email: "auditor@example.com" }).update({ active: true });
    }
  });
});
