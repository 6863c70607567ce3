import { describe, expect, it } from "vitest";
import { findAutoFileBar } from "@/lib/ml/auto-file";
import { assignStratifiedFolds, createRandom } from "@/lib/ml/folds";
import { computeMetrics } from "@/lib/ml/metrics";
import { runPythonReference } from "@/lib/ml/reference/export";
import { requireSklearn } from "./helpers";

interface SkReport {
  sklearn: string;
  report: Record<string, { precision: number; recall: number; "f1-score": number; support: number }>;
  confusion: number[][];
}

describe("metrics", () => {
  // Reference: classification_report and confusion_matrix of Debian's python3-sklearn, on
  // seeded random labels with an unpredicted class and an unseen one (both edge cases).
  it("equal scikit-learn's classification_report and confusion_matrix", () => {
    requireSklearn();
    const labels = ["a", "b", "c", "d", "e"];
    const random = createRandom(7);
    const truth = Array.from({ length: 300 }, () => Math.floor(random() * 4));
    const predicted = truth.map((t) => (random() < 0.7 ? t : [0, 1, 2, 4][Math.floor(random() * 4)]));
    const ranked = predicted.map((p) => [p, (p + 1) % 5, (p + 2) % 5]);
    const ours = computeMetrics(labels, truth, ranked);
    const sk = runPythonReference<SkReport>("sklearn_metrics.py", {
      labels,
      truth: truth.map((t) => labels[t]),
      predicted: predicted.map((p) => labels[p]),
    });
    expect(ours.confusion.matrix).toEqual(sk.confusion);
    for (const c of ours.perClass) {
      expect(c.precision).toBeCloseTo(sk.report[c.label].precision, 12);
      expect(c.recall).toBeCloseTo(sk.report[c.label].recall, 12);
      expect(c.f1).toBeCloseTo(sk.report[c.label]["f1-score"], 12);
      expect(c.support).toBe(sk.report[c.label].support);
    }
    expect(ours.macroF1).toBeCloseTo(sk.report["macro avg"]["f1-score"], 12);
    expect(ours.weightedF1).toBeCloseTo(sk.report["weighted avg"]["f1-score"], 12);
    expect(ours.accuracy).toBeCloseTo(sk.report.accuracy as unknown as number, 12);
  });

  it("count top-3 hits", () => {
    const m = computeMetrics(["a", "b", "c", "d"], [0, 1, 2, 3], [[0, 1, 2], [0, 2, 1], [3, 1, 0], [0, 1, 2]]);
    expect(m.accuracy).toBe(0.25);
    expect(m.top3Accuracy).toBe(0.5);
  });
});

describe("auto-file bar", () => {
  it("is the lowest confidence at which precision still reaches the target (checked by brute force)", () => {
    const random = createRandom(3);
    const conf = Array.from({ length: 500 }, () => Math.round(random() * 100) / 100);
    const correct = conf.map((c) => random() < 0.5 + c / 2);
    const bar = findAutoFileBar(conf, correct, 0.9);
    const precisionAt = (t: number) => {
      const pass = conf.map((c, i) => [c, correct[i]] as const).filter(([c]) => c >= t);
      return pass.filter(([, ok]) => ok).length / pass.length;
    };
    const candidates = [...new Set(conf)].filter((t) => precisionAt(t) >= 0.9);
    expect(bar.threshold).toBe(Math.min(...candidates));
    expect(bar.precision).toBeCloseTo(precisionAt(bar.threshold!), 12);
    expect(bar.share).toBeCloseTo(conf.filter((c) => c >= bar.threshold!).length / conf.length, 12);
  });

  it("stays off when no confidence reaches the target", () => {
    expect(findAutoFileBar([0.9, 0.8], [false, false], 0.98).threshold).toBeNull();
  });
});

describe("stratified folds", () => {
  it("put about 1/k of each class in each fold and repeat with the same seed", () => {
    const labels = Array.from({ length: 230 }, (_, i) => (i % 10 < 7 ? "big" : i % 10 < 9 ? "mid" : "small"));
    const folds = assignStratifiedFolds(labels, 5, 11);
    expect(assignStratifiedFolds(labels, 5, 11)).toEqual(folds);
    for (const label of ["big", "mid", "small"]) {
      const counts = [0, 0, 0, 0, 0];
      labels.forEach((l, i) => l === label && counts[folds[i]]++);
      expect(Math.max(...counts) - Math.min(...counts)).toBeLessThanOrEqual(1);
    }
  });
});
