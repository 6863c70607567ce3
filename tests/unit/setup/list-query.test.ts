import { describe, expect, it } from "vitest";
import { hrefWith, matchesQuery, readParams, sortBy } from "@/components/setup/list-query";
import { learningStatus, retentionWords } from "@/components/setup/learning-status";

describe("Setup tables' URL state", () => {
  it("reads single non-empty values and writes links that change one parameter", () => {
    const p = readParams({ q: "  lease ", show: "", sort: ["name", "filed"], dir: undefined });
    expect(p).toEqual({ q: "lease", sort: "name" });
    expect(hrefWith("/setup/matters", p, { sort: "opened", dir: "desc" })).toBe("/setup/matters?q=lease&sort=opened&dir=desc");
    expect(hrefWith("/setup/matters", { edit: "3" }, { edit: undefined })).toBe("/setup/matters");
  });

  it("sorts text without regard to case and numbers inside text by value, both ways, nulls last", () => {
    const rows = [{ n: "b-10" }, { n: "B-9" }, { n: "a-2" }, { n: null }];
    expect(sortBy(rows, (r) => r.n, "asc").map((r) => r.n)).toEqual(["a-2", "B-9", "b-10", null]);
    expect(sortBy(rows, (r) => r.n, "desc").map((r) => r.n)).toEqual(["b-10", "B-9", "a-2", null]);
  });

  it("matches every word of a search in any of the texts", () => {
    expect(matchesQuery("heron lease", ["Heron Boatworks", "Yard lease"])).toBe(true);
    expect(matchesQuery("heron survey", ["Heron Boatworks", "Yard lease"])).toBe(false);
    expect(matchesQuery(undefined, [])).toBe(true);
  });
});

describe("what the screen says about learning a type", () => {
  it("counts the filed examples still needed, then waits for a retrain, then says learned", () => {
    expect(learningStatus({ active: true, humanFiledCount: 2, learned: false, minExamples: 5 }).text).toBe("Needs 3 more filed examples; ranks by its description until then");
    expect(learningStatus({ active: true, humanFiledCount: 4, learned: false, minExamples: 5 }).text).toMatch(/^Needs 1 more filed example;/);
    expect(learningStatus({ active: true, humanFiledCount: 5, learned: false, minExamples: 5 }).text).toMatch(/next retrain/);
    expect(learningStatus({ active: true, humanFiledCount: 9, learned: true, minExamples: 5 }).text).toBe("Learned by the model (9 filed examples)");
    expect(learningStatus({ active: false, humanFiledCount: 9, learned: true, minExamples: 5 }).tone).toBe("retired");
  });

  it("words retention", () => {
    expect(retentionWords(7, "after_matter_close")).toBe("7 years after the matter closes");
    expect(retentionWords(1, "after_filing")).toBe("1 year after filing");
    expect(retentionWords(null, "permanent")).toBe("Permanent");
  });
});
