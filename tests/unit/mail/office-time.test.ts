import { afterEach, describe, expect, it, vi } from "vitest";

// The daily digest runs at DIGEST_HOUR in OFFICE_TIME_ZONE, and "today" is the office's day. The
// expected instants follow from the IANA time zone database's rules for America/New_York
// (UTC−5 in December) and Asia/Tokyo (UTC+9, no daylight saving), from memory.
describe("the office's day and the digest hour", () => {
  afterEach(() => {
    vi.unstubAllEnvs();
    vi.resetModules();
  });

  it("names the calendar day in the office's time zone", async () => {
    vi.stubEnv("OFFICE_TIME_ZONE", "America/New_York");
    const { officeDay } = await import("@/lib/data/notices");
    expect(officeDay(new Date("2026-12-02T03:00:00Z"))).toBe("2026-12-01"); // 22:00 the evening before in New York
    expect(officeDay(new Date("2026-12-02T06:00:00Z"))).toBe("2026-12-02");
  });

  it("schedules the digest at DIGEST_HOUR office time", async () => {
    vi.stubEnv("OFFICE_TIME_ZONE", "Asia/Tokyo");
    vi.stubEnv("DIGEST_HOUR", "7");
    const { scheduleDailyDigest } = await import("@/lib/jobs/schedule");
    const cron = scheduleDailyDigest();
    try {
      expect(cron.nextRun(new Date("2026-12-02T00:00:00Z"))?.toISOString()).toBe("2026-12-02T22:00:00.000Z"); // 07:00 on the 3rd in Tokyo
    } finally {
      cron.stop();
    }
  });

  it("refuses an hour that is not one", async () => {
    vi.stubEnv("DIGEST_HOUR", "24");
    await expect(import("@/lib/env")).rejects.toThrow(/DIGEST_HOUR is an hour of the day from 0 to 23/);
  });
});
