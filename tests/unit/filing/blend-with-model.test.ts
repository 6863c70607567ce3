import { describe, expect, it } from "vitest";
import { blendWithModel } from "@/lib/filing/cold-start";

const sum = (xs: { confidence: number }[]) => xs.reduce((a, b) => a + b.confidence, 0);
// Cold-start confidences over all four active types (1, 2, 3, 4).
const COLD = [
  { cabinetTypeId: 4, confidence: 0.4 },
  { cabinetTypeId: 1, confidence: 0.3 },
  { cabinetTypeId: 2, confidence: 0.2 },
  { cabinetTypeId: 3, confidence: 0.1 },
];

describe("blendWithModel", () => {
  it("gives each cold type its cold-start confidence and the model's types the rest, in proportion", () => {
    const model = [
      { cabinetTypeId: 1, confidence: 0.6, probability: 0.9 },
      { cabinetTypeId: 2, confidence: 0.3, probability: 0.45 },
      { cabinetTypeId: 3, confidence: 0.1, probability: 0.15 },
    ];
    const blended = blendWithModel(model, COLD, [4]);
    expect(blended).toEqual([
      { cabinetTypeId: 4, confidence: expect.closeTo(0.4, 12), probability: null, source: "description" },
      { cabinetTypeId: 1, confidence: expect.closeTo(0.36, 12), probability: 0.9, source: "model" },
      { cabinetTypeId: 2, confidence: expect.closeTo(0.18, 12), probability: 0.45, source: "model" },
      { cabinetTypeId: 3, confidence: expect.closeTo(0.06, 12), probability: 0.15, source: "model" },
    ]);
    expect(sum(blended)).toBeCloseTo(1, 12);
  });

  it("treats a trained type with too few examples as cold and renormalises the model without it", () => {
    const model = [
      { cabinetTypeId: 1, confidence: 0.5 },
      { cabinetTypeId: 2, confidence: 0.25 },
      { cabinetTypeId: 3, confidence: 0.25 },
    ];
    const blended = blendWithModel(model, COLD, [3, 4]);
    const byId = new Map(blended.map((b) => [b.cabinetTypeId, b]));
    expect(byId.get(3)).toMatchObject({ confidence: expect.closeTo(0.1, 12), source: "description", probability: null });
    expect(byId.get(1)!.confidence).toBeCloseTo(0.5 * (2 / 3), 12);
    expect(byId.get(2)!.confidence).toBeCloseTo(0.5 * (1 / 3), 12);
    expect(sum(blended)).toBeCloseTo(1, 12);
  });

  it("adds every active type the model has never seen, even when not listed as cold", () => {
    const blended = blendWithModel([{ cabinetTypeId: 1, confidence: 1 }], COLD, []);
    expect(blended.map((b) => b.cabinetTypeId).sort()).toEqual([1, 2, 3, 4]);
    expect(blended.find((b) => b.cabinetTypeId === 1)).toMatchObject({ confidence: expect.closeTo(0.3, 12), source: "model" });
    expect(sum(blended)).toBeCloseTo(1, 12);
  });

  it("keeps the model ranking as it is when no type is cold", () => {
    const model = [
      { cabinetTypeId: 2, confidence: 0.7, probability: 0.8 },
      { cabinetTypeId: 1, confidence: 0.3, probability: 0.3 },
    ];
    const cold = [
      { cabinetTypeId: 1, confidence: 0.9 },
      { cabinetTypeId: 2, confidence: 0.1 },
    ];
    expect(blendWithModel(model, cold, [])).toEqual([
      { cabinetTypeId: 2, confidence: 0.7, probability: 0.8, source: "model" },
      { cabinetTypeId: 1, confidence: 0.3, probability: 0.3, source: "model" },
    ]);
  });

  it("falls back to the cold-start ranking alone when the model covers no remaining type", () => {
    const blended = blendWithModel([], COLD.slice(0, 2), [4, 1]);
    expect(blended.map((b) => [b.cabinetTypeId, b.source])).toEqual([
      [4, "description"],
      [1, "description"],
    ]);
    expect(blended[0].confidence).toBeCloseTo(0.4 / 0.7, 12);
    expect(sum(blended)).toBeCloseTo(1, 12);
  });

  it("splits evenly when there is no evidence at all, and orders ties by source then id", () => {
    const blended = blendWithModel([], [], [9, 5]);
    expect(blended).toEqual([
      { cabinetTypeId: 5, confidence: 0.5, probability: null, source: "description" },
      { cabinetTypeId: 9, confidence: 0.5, probability: null, source: "description" },
    ]);
    const tie = blendWithModel([{ cabinetTypeId: 8, confidence: 1 }], [{ cabinetTypeId: 2, confidence: 0.5 }, { cabinetTypeId: 8, confidence: 0.5 }], [2]);
    expect(tie.map((b) => b.cabinetTypeId)).toEqual([8, 2]);
    expect(blendWithModel([], [], [])).toEqual([]);
  });
});
