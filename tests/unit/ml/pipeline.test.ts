import { beforeAll, describe, expect, it } from "vitest";
import { loadModel, predictDocuments, saveModel, trainModel, type FoldwrightModel } from "@/lib/ml/index";
import type { LabelledDocument } from "@/lib/ml/types";
import { mostFrequentLabels, readCuad, sliceCuad } from "./helpers";

// Invariants of the whole pipeline on a small CUAD slice (The Atticus Project, CC BY 4.0):
// 6 clause types, at most 60 training and 20 test spans each.
let train: LabelledDocument[];
let test: LabelledDocument[];
let model: FoldwrightModel;

beforeAll(async () => {
  const all = readCuad("train");
  const top = mostFrequentLabels(all, 6);
  train = sliceCuad(all, top, 60);
  test = sliceCuad(readCuad("test"), top, 20);
  model = await trainModel(train, { threads: 1 });
}, 60_000);

describe("predictions", () => {
  it("give probabilities in (0, 1), confidences summing to 1 and the arg max as the suggestion", () => {
    for (const p of predictDocuments(model, test)) {
      expect(p.ranked.length).toBe(model.classes.length);
      let sum = 0;
      for (const r of p.ranked) {
        expect(r.probability).toBeGreaterThan(0);
        expect(r.probability).toBeLessThan(1);
        sum += r.confidence;
      }
      expect(sum).toBeCloseTo(1, 12);
      const best = p.ranked.reduce((a, b) => (b.probability > a.probability ? b : a));
      expect(p.label).toBe(best.label);
      expect(p.confidence).toBe(best.confidence);
      expect(p.noConfidentMatch).toBe(p.confidence < model.options.floor);
      for (const w of p.why) expect(w.contribution).toBeGreaterThan(0);
    }
  });

  it("explain with the terms that push the suggested class most", () => {
    const p = predictDocuments(model, [test[0]], 3)[0];
    expect(p.why.length).toBeLessThanOrEqual(3);
    const contributions = p.why.map((w) => w.contribution);
    expect([...contributions].sort((a, b) => b - a)).toEqual(contributions);
  });

  it("say 'no confident match' below the floor", async () => {
    const strict = { ...model, options: { ...model.options, floor: 1.01 } };
    expect(predictDocuments(strict, test.slice(0, 3)).every((p) => p.noConfidentMatch)).toBe(true);
  });

  it("do not change when class labels are renamed or documents reordered", async () => {
    const renamed = train.map((d) => ({ ...d, label: `zz-${[...d.label].reverse().join("")}` }));
    const shuffled = [...renamed].reverse();
    const other = await trainModel(shuffled, { threads: 1 });
    const a = predictDocuments(model, test);
    const b = predictDocuments(other, test);
    a.forEach((p, i) => {
      expect(b[i].label).toBe(`zz-${[...p.label].reverse().join("")}`);
      expect(b[i].confidence).toBeCloseTo(p.confidence, 5);
    });
  });

  it("survive save → load unchanged", () => {
    const loaded = loadModel(saveModel(model));
    expect(loaded.classes).toEqual(model.classes);
    expect(predictDocuments(loaded, test)).toEqual(predictDocuments(model, test));
  });
});

describe("model file", () => {
  it("is checked for kind and format version on load", () => {
    const bytes = saveModel(model);
    const text = new TextDecoder().decode(bytes.subarray(0, 400));
    const tamper = (from: string, to: string) => {
      const copy = bytes.slice();
      const at = text.indexOf(from);
      copy.set(new TextEncoder().encode(to), at);
      return copy;
    };
    expect(() => loadModel(tamper('"kind":"foldwright-model"', '"kind":"foldwright-modeX"'))).toThrow(/foldwright-modeX/);
    expect(() => loadModel(tamper('"formatVersion":1', '"formatVersion":9'))).toThrow(/version 9/);
    expect(() => loadModel(bytes.subarray(0, bytes.length - 100))).toThrow(/damaged|cut short/);
    expect(() => loadModel(new TextEncoder().encode("not a model"))).toThrow(/not a Foldwright model/);
  });
});

describe("input checks", () => {
  it("reject empty input, a single class, a missing label and NaN metadata", async () => {
    await expect(trainModel([])).rejects.toThrow(/no documents/);
    await expect(trainModel([{ text: "a b", label: "x" }, { text: "c d", label: "x" }])).rejects.toThrow(/two different labels/);
    await expect(trainModel([{ text: "a", label: "" }, { text: "b", label: "y" }])).rejects.toThrow(/no label/);
    const nan = [{ text: "fee letter", label: "x", meta: { pages: Number.NaN } }, { text: "bank", label: "y" }];
    await expect(trainModel(nan)).rejects.toThrow(/page count/);
  });
});
