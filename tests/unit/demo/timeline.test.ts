import { describe, expect, it } from "vitest";
import { DEMO_NEWEST_AGE_MS, demoFilingTime, demoUploadTime } from "@/lib/demo/timeline";

// The demo office's history must lie in the past: the Intake list once showed tomorrow's dates
// because the waiting documents' times were counted forward from the filed ones.
describe("demo timeline", () => {
  const now = Date.UTC(2026, 11, 2, 6, 0, 0);
  const count = 312; // 300 filed + 12 waiting, as the demo seed makes

  it("puts every upload and every filing before the seed ran, oldest first", () => {
    let previous = -Infinity;
    for (let i = 0; i < count; i++) {
      const at = demoUploadTime(i, count, now);
      expect(at.getTime()).toBeLessThanOrEqual(now - DEMO_NEWEST_AGE_MS);
      expect(at.getTime()).toBeGreaterThan(previous);
      expect(demoFilingTime(at, now).getTime()).toBeLessThanOrEqual(now);
      expect(demoFilingTime(at, now).getTime()).toBeGreaterThanOrEqual(at.getTime());
      previous = at.getTime();
    }
    expect(demoUploadTime(count - 1, count, now).getTime()).toBe(now - DEMO_NEWEST_AGE_MS);
  });
});
