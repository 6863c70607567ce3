import { describe, expect, it } from "vitest";
import { listDemoMatters } from "@/lib/demo/demo-matters";
import { generateDemoDocuments } from "@/lib/demo/documents";
import { decideMatter, matchMatters } from "@/lib/filing/match-matter";
import { crossValidate } from "@/lib/ml";

// The demo should show a useful but imperfect model: look-alike templates and covering letters
// keep it from learning every document by heart.
describe("generated demo documents with lib/ml", () => {
  it("train a model that is right most of the time but not always (5-fold, 300 documents)", { timeout: 180_000 }, async () => {
    const docs = await generateDemoDocuments({ count: 300, seed: 5 });
    const report = await crossValidate(
      docs.map((d) => ({ text: d.text, filename: d.fileName, label: d.cabinetTypeName })),
      5,
      { threads: 1 },
    );
    expect(report.accuracy).toBeGreaterThan(0.7);
    expect(report.accuracy).toBeLessThan(0.99);
  });

  it("name their client clearly enough for matter matching", { timeout: 120_000 }, async () => {
    const matters = listDemoMatters().map((m, i) => ({ id: i + 1, ...m, status: "open" as const }));
    const docs = await generateDemoDocuments({ count: 80, seed: 6 });
    let wrongClient = 0;
    let decidedWrong = 0;
    for (const d of docs) {
      const truth = matters.find((m) => m.number === d.matterNumber)!;
      const candidates = matchMatters(d.text, d.fileName, matters);
      if (matters.find((m) => m.id === candidates[0]?.matterId)?.clientName !== truth.clientName) wrongClient++;
      const { matterId } = decideMatter(candidates);
      if (matterId !== null && matterId !== truth.id) decidedWrong++;
    }
    expect(wrongClient).toBe(0);
    // A client's other matter may win on title words ("tax return" in a notice filed to the
    // lease matter); that must stay rare.
    expect(decidedWrong / docs.length).toBeLessThan(0.1);
  });
});
