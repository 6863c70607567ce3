import { afterEach, describe, expect, it, vi } from "vitest";

describe("session secret", () => {
  afterEach(() => {
    vi.unstubAllEnvs();
    vi.resetModules();
  });

  it("refuses a secret under 32 characters in production", async () => {
    vi.stubEnv("NODE_ENV", "production");
    vi.stubEnv("SESSION_SECRET", "too-short");
    const { sessionSecret } = await import("@/lib/env");
    expect(() => sessionSecret()).toThrow(/at least 32 characters/);
  });

  it("accepts a 32-character secret in production", async () => {
    vi.stubEnv("NODE_ENV", "production");
    vi.stubEnv("SESSION_SECRET", "x".repeat(32));
    const { sessionSecret } = await import("@/lib/env");
    expect(sessionSecret()).toBe("x".repeat(32));
  });

  it("rejects a port that is not a number", async () => {
    vi.stubEnv("PORT", "eighty");
    await expect(import("@/lib/env")).rejects.toThrow(/PORT must be a whole number/);
  });
});
