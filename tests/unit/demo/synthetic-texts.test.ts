import { describe, expect, it } from "vitest";
import { generateSyntheticTexts } from "@/lib/demo/synthetic-texts";
import { crossValidate } from "@/lib/ml";

describe("generateSyntheticTexts", () => {
  it("is the same for a seed and different for another", () => {
    const a = generateSyntheticTexts({ count: 50, classes: 5, seed: 9 });
    expect(generateSyntheticTexts({ count: 50, classes: 5, seed: 9 })).toEqual(a);
    expect(generateSyntheticTexts({ count: 50, classes: 5, seed: 10 })).not.toEqual(a);
  });

  it("scales to 10,000 texts over 30 balanced classes", () => {
    const texts = generateSyntheticTexts({ count: 10_000, classes: 30, seed: 1 });
    expect(texts).toHaveLength(10_000);
    const perClass = new Map<string, number>();
    for (const t of texts) perClass.set(t.label, (perClass.get(t.label) ?? 0) + 1);
    expect(perClass.size).toBe(30);
    expect(Math.min(...perClass.values())).toBeGreaterThanOrEqual(333);
    expect(Math.max(...perClass.values())).toBeLessThanOrEqual(334);
    expect(perClass.has("class-01") && perClass.has("class-30")).toBe(true);
    for (const t of texts.slice(0, 100)) {
      const words = t.text.split(" ");
      expect(words.length).toBeGreaterThanOrEqual(60);
      expect(words.length).toBeLessThanOrEqual(240);
      for (const w of words) expect(w).toMatch(/^[a-z]+$/);
    }
  });

  it("takes the labels it is given", () => {
    const texts = generateSyntheticTexts({ count: 6, classes: ["Invoices", "Leases", "Minutes"], seed: 2 });
    expect(texts.map((t) => t.label)).toEqual(["Invoices", "Leases", "Minutes", "Invoices", "Leases", "Minutes"]);
  });

  it("refuses no classes and a bad count with a sentence", () => {
    expect(() => generateSyntheticTexts({ count: 5, classes: [], seed: 1 })).toThrow(/at least one class/);
    expect(() => generateSyntheticTexts({ count: 1.5, classes: 3, seed: 1 })).toThrow(/count must be a whole number/);
  });

  it("is learnable but not trivially (5-fold accuracy between 0.7 and 0.99)", { timeout: 120_000 }, async () => {
    const report = await crossValidate(generateSyntheticTexts({ count: 300, classes: 10, seed: 4 }), 5, { threads: 1 });
    expect(report.accuracy).toBeGreaterThan(0.7);
    expect(report.accuracy).toBeLessThan(0.99);
  });
});
