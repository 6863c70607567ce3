import { describe, expect, it } from "vitest";
import { createRandom, formatDate, formatMoney } from "@/lib/demo/random";

describe("createRandom", () => {
  it("repeats its sequence for a seed and stays in range", () => {
    const a = createRandom(123);
    const b = createRandom(123);
    const xs = Array.from({ length: 1000 }, () => a.next());
    expect(Array.from({ length: 1000 }, () => b.next())).toEqual(xs);
    for (const x of xs) {
      expect(x).toBeGreaterThanOrEqual(0);
      expect(x).toBeLessThan(1);
    }
    expect(createRandom(124).next()).not.toBe(xs[0]);
  });

  it("draws whole numbers at both ends of a range and shuffles without losing items", () => {
    const rng = createRandom(7);
    const seen = new Set(Array.from({ length: 500 }, () => rng.int(1, 6)));
    expect([...seen].sort()).toEqual([1, 2, 3, 4, 5, 6]);
    const items = ["a", "b", "c", "d", "e", "f", "g"];
    const shuffled = rng.shuffle(items);
    expect([...shuffled].sort()).toEqual(items);
    expect(items).toEqual(["a", "b", "c", "d", "e", "f", "g"]);
    const amount = rng.money(10, 20);
    expect(Math.round(amount * 100) / 100).toBe(amount);
  });
});

describe("formatting", () => {
  it("writes money and dates the way office paper does", () => {
    expect(formatMoney(1296.4)).toBe("1,296.40");
    const date = new Date(Date.UTC(2026, 2, 4));
    expect([0, 1, 2].map((s) => formatDate(date, s))).toEqual(["March 4, 2026", "2026-03-04", "03/04/2026"]);
  });
});
