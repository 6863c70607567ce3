import { describe, expect, it } from "vitest";
import { evaluateSplit } from "@/lib/ml/evaluate";
import { readCuad } from "./helpers";

// End-to-end quality on open data: CUAD v1 clause types (The Atticus Project, CC BY 4.0), the
// train/test split of ../shared/data/cuad-clauses. Reference figures from that folder's README,
// measured with scikit-learn 1.2.1 (Debian python3-sklearn), TfidfVectorizer(sublinear_tf=True,
// ngram_range=(1, 2), min_df=2) + OneVsRestClassifier(LogisticRegression(C=10, liblinear)).
const SKLEARN = { accuracy: 0.8723, macroF1: 0.6623, top3Accuracy: 0.9514 };

describe("CUAD clause types, full split", () => {
  it("is within 0.5 points of scikit-learn on accuracy and macro-F1, and no lower on top-3", async () => {
    const report = await evaluateSplit(readCuad("train"), readCuad("test"));
    console.info(
      `CUAD: accuracy ${report.accuracy.toFixed(4)}, macro-F1 ${report.macroF1.toFixed(4)}, top-3 ${report.top3Accuracy.toFixed(4)}, ` +
        `auto-file bar ${report.autoFile.threshold?.toFixed(3)} passing ${(report.autoFile.share * 100).toFixed(1)}%`,
    );
    expect(report.documents).toBe(2553);
    expect(report.accuracy).toBeGreaterThanOrEqual(SKLEARN.accuracy - 0.005);
    expect(report.macroF1).toBeGreaterThanOrEqual(SKLEARN.macroF1 - 0.005);
    expect(report.top3Accuracy).toBeGreaterThanOrEqual(SKLEARN.top3Accuracy);
  }, 120_000);
});
