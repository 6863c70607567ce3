import { describe, expect, it } from "vitest";
import { isSessionLive } from "@/lib/auth/session";
import { env } from "@/lib/env";

describe("session expiry", () => {
  const now = Date.UTC(2026, 11, 1, 12, 0, 0);
  const idle = env.session.idleMinutes * 60_000;

  it("is live while used within the idle limit", () => {
    expect(isSessionLive({ userId: 1, epoch: 0, issuedAt: now - 3_600_000, lastSeen: now - idle + 1000 }, now)).toBe(true);
  });

  it("expires after the idle limit without activity", () => {
    expect(isSessionLive({ userId: 1, epoch: 0, issuedAt: now - 3_600_000, lastSeen: now - idle - 1000 }, now)).toBe(false);
  });

  it("expires after the absolute limit even when active", () => {
    const max = env.session.maxHours * 3_600_000;
    expect(isSessionLive({ userId: 1, epoch: 0, issuedAt: now - max - 1000, lastSeen: now }, now)).toBe(false);
  });

  it("is not live without a user", () => {
    expect(isSessionLive({}, now)).toBe(false);
  });
});
