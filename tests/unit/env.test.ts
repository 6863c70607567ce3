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

describe("the app's own origins (the CSRF check)", () => {
  afterEach(() => {
    vi.unstubAllEnvs();
    vi.resetModules();
  });

  it("are APP_ORIGIN plus APP_ORIGINS, each reduced to scheme, host and port (WHATWG URL origin)", async () => {
    vi.stubEnv("APP_ORIGIN", "https://files.example.com/");
    vi.stubEnv("APP_ORIGINS", "http://10.0.0.5:3000/login, HTTPS://Intranet.Example:443");
    const { env } = await import("@/lib/env");
    expect(env.origins).toEqual(["https://files.example.com", "http://10.0.0.5:3000", "https://intranet.example"]);
  });

  it("accept localhost beside 127.0.0.1 when no APP_ORIGIN is set", async () => {
    vi.stubEnv("APP_ORIGIN", "");
    vi.stubEnv("APP_ORIGINS", "");
    vi.stubEnv("PORT", "3999");
    const { env } = await import("@/lib/env");
    expect(env.origins).toEqual(["http://127.0.0.1:3999", "http://localhost:3999"]);
  });

  it("refuse a value that is not an origin, naming it", async () => {
    vi.stubEnv("APP_ORIGINS", "files.example.com");
    await expect(import("@/lib/env")).rejects.toThrow(/"files.example.com", which is not an origin/);
  });
});
