import { describe, expect, it } from "vitest";
import { DEFAULT_QUERY, pageWords, parseQueueQuery, queueApiUrl, queueSearchParams } from "@/components/review/queue-query";

// The To review screen's query in the address: what is read back is what was written, and a
// malformed address falls back to the defaults instead of failing.
describe("the To review query in the address", () => {
  it("reads back what it writes", () => {
    const q = { ...DEFAULT_QUERY, sort: "confidence" as const, dir: "desc" as const, cabinetType: 4, confidence: "below:0.5", q: "invoice 0117", page: 3 };
    expect(parseQueueQuery(queueSearchParams(q))).toEqual(q);
    expect(queueSearchParams(q).toString()).toBe("sort=confidence&dir=desc&cabinetType=4&confidence=below%3A0.5&q=invoice+0117&page=3");
  });

  it("writes nothing for the defaults, so a bare /review is the default queue", () => {
    expect(queueSearchParams(DEFAULT_QUERY).toString()).toBe("");
    expect(parseQueueQuery({})).toEqual(DEFAULT_QUERY);
  });

  it("falls back to the defaults for malformed values", () => {
    expect(parseQueueQuery(new URLSearchParams("sort=drop&dir=sideways&cabinetType=-2&matter=x&page=0&confidence=above:0.1&list=all"))).toEqual(DEFAULT_QUERY);
    expect(parseQueueQuery({ q: ["first", "second"] }).q).toBe("first");
  });

  it("asks the API for the page and turns the confidence choice into its bound", () => {
    const url = new URL(queueApiUrl({ ...DEFAULT_QUERY, confidence: "above:0.9", page: 2 }), "http://x");
    expect(Object.fromEntries(url.searchParams)).toEqual({ list: "review", sort: "age", dir: "asc", page: "2", pageSize: "100", minConfidence: "0.9" });
  });

  it("says which rows of how many are shown", () => {
    expect(pageWords(1, 100, 100, 336)).toBe("1–100 of 336");
    expect(pageWords(4, 100, 36, 336)).toBe("301–336 of 336");
    expect(pageWords(1, 100, 3, 3)).toBe("3 of 3");
    expect(pageWords(1, 100, 0, 0)).toBe("none of 0");
  });
});
