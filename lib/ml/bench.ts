// `npm run bench:classifier`: one run on this machine of our vectorise / fit / predict on the
// CUAD clause split (The Atticus Project, CC BY 4.0) beside scikit-learn (Debian python3-sklearn,
// run as a child process through /usr/bin/python3) with liblinear and lbfgs — on its README
// pipeline and on our exact matrix — and ml-logistic-regression on a small dense subset; then the
// prediction latency of a 3,000-word document after loading, and the size of a 50,000-term ×
// 40-class model file. Prints JSON figures and ratios; asserts nothing (speed is not a test).
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { loadModel, saveModel } from "./artifact";
import { predictRows } from "./predict";
import { trainModel, predictDocument, tokenizeAll, type FoldwrightModel } from "./model";
import { transformTokens } from "./tfidf";
import { computeMetrics } from "./metrics";
import { exportCsr, runPythonReference } from "./reference/export";
import { runDenseBaseline } from "./bench-dense";
import type { LabelledDocument } from "./types";

const DATA = path.resolve(import.meta.dirname ?? __dirname, "../../../shared/data/cuad-clauses");

function readSplit(name: string): LabelledDocument[] {
  return fs.readFileSync(path.join(DATA, `${name}.jsonl`), "utf8").split("\n").filter((l) => l.trim()).map((l) => JSON.parse(l) as LabelledDocument);
}

const round = (v: number, d = 3) => Math.round(v * 10 ** d) / 10 ** d;

/** Trains and tests our pipeline with a given thread count. */
async function benchOurs(train: LabelledDocument[], test: LabelledDocument[], threads: number) {
  const model = await trainModel(train, { threads });
  const t0 = performance.now();
  const x = transformTokens(tokenizeAll(test, model.options.tokenize), model.vocabulary);
  const t1 = performance.now();
  const preds = predictRows(model, x, model.options.floor, 0);
  const t2 = performance.now();
  const id = new Map(model.classes.map((c, k) => [c, k]));
  const m = computeMetrics(model.classes, test.map((d) => id.get(d.label) ?? 0), preds.map((p) => p.ranked.map((r) => id.get(r.label)!)));
  return {
    model,
    figures: {
      threads,
      vectoriseSeconds: round((model.timings.vectoriseMs + (t1 - t0)) / 1000),
      fitSeconds: round(model.timings.fitMs / 1000),
      predictSeconds: round((t2 - t1) / 1000),
      accuracy: round(m.accuracy, 4),
      macroF1: round(m.macroF1, 4),
      top3Accuracy: round(m.top3Accuracy, 4),
      terms: model.terms.length,
    },
  };
}

/** scikit-learn on our exact training matrix, for a like-for-like fit time. */
function benchSklearnOnOurMatrix(model: FoldwrightModel, train: LabelledDocument[]) {
  const x = transformTokens(tokenizeAll(train, model.options.tokenize), model.vocabulary);
  const id = new Map(model.classes.map((c, k) => [c, k]));
  const runs = [];
  for (const solver of ["liblinear", "lbfgs"]) {
    for (const nJobs of [null, 2]) {
      const r = runPythonReference<{ fitSeconds: number }>("sklearn_reference.py", {
        train: exportCsr(x),
        labels: train.map((d) => id.get(d.label)!),
        C: model.options.C,
        solver,
        tol: 1e-4,
        maxIter: 1000,
        nJobs,
        returnWeights: false,
      });
      runs.push({ solver, nJobs: nJobs ?? 1, fitSeconds: round(r.fitSeconds) });
    }
  }
  return { nonZeros: x.data.length, runs };
}

/** Median time to predict one 3,000-word document with a model loaded from bytes. */
function benchLatency(model: FoldwrightModel, test: LabelledDocument[]) {
  const loaded = loadModel(saveModel(model));
  const words = test.map((d) => d.text).join(" ").split(/\s+/).slice(0, 3000).join(" ");
  predictDocument(loaded, { text: words });
  const times: number[] = [];
  for (let r = 0; r < 21; r++) {
    const t = performance.now();
    predictDocument(loaded, { text: words });
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  return { words: 3000, medianMs: round(times[10], 2), maxMs: round(times[20], 2) };
}

/** File size of a model with 50,000 terms × 40 classes (synthetic terms and weights). */
function benchSize(model: FoldwrightModel) {
  const terms = Array.from({ length: 50_000 }, (_, j) => `term${j.toString(36).padStart(6, "0")} bigram`);
  const classes = Array.from({ length: 40 }, (_, k) => `cabinet type ${k}`);
  const big: FoldwrightModel = {
    ...model,
    classes,
    terms,
    vocabulary: { terms, idf: new Float64Array(50_000).fill(3.2), index: new Map() },
    weights: Float32Array.from({ length: 40 * 50_000 }, (_, i) => Math.sin(i)),
    intercepts: new Float64Array(40).fill(-3),
  };
  const bytes = saveModel(big).byteLength;
  return { terms: 50_000, classes: 40, bytes, megabytes: round(bytes / 1e6, 2), cuadModelBytes: saveModel(model).byteLength };
}

interface SklearnBench {
  sklearn: string;
  vectoriseSeconds: number;
  terms: number;
  nonZeros: number;
  runs: Array<{ solver: string; nJobs: number; fitSeconds: number; predictSeconds: number; accuracy: number; macroF1: number; top3Accuracy: number }>;
}

async function main(): Promise<void> {
  const train = readSplit("train");
  const test = readSplit("test");
  const machine = { cpus: os.cpus().length, model: os.cpus()[0]?.model, node: process.version, loadAverage: os.loadavg().map((v) => round(v, 2)) };
  const ours2 = await benchOurs(train, test, 2);
  const ours1 = await benchOurs(train, test, 1);
  const readme = runPythonReference<SklearnBench>("sklearn_bench.py", { train: path.join(DATA, "train.jsonl"), test: path.join(DATA, "test.jsonl") });
  const sameMatrix = benchSklearnOnOurMatrix(ours2.model, train);
  const liblinearReadme = Math.min(...readme.runs.filter((r) => r.solver === "liblinear").map((r) => r.fitSeconds));
  const liblinearSame = Math.min(...sameMatrix.runs.filter((r) => r.solver === "liblinear").map((r) => r.fitSeconds));
  const report = {
    machine,
    ours: [ours2.figures, ours1.figures],
    sklearnReadmePipeline: { ...readme, runs: readme.runs.map((r) => ({ ...r, fitSeconds: round(r.fitSeconds), predictSeconds: round(r.predictSeconds), accuracy: round(r.accuracy, 4), macroF1: round(r.macroF1, 4), top3Accuracy: round(r.top3Accuracy, 4) })), vectoriseSeconds: round(readme.vectoriseSeconds) },
    sklearnOnOurMatrix: sameMatrix,
    ratios: {
      note: "our fit time on 2 threads ÷ the faster of liblinear with n_jobs 1 or 2; ≤ 1.0 is the goal",
      fitVsLiblinearReadmePipeline: round(ours2.figures.fitSeconds / liblinearReadme),
      fitVsLiblinearSameMatrix: round(ours2.figures.fitSeconds / liblinearSame),
      vectoriseVsSklearn: round(ours2.figures.vectoriseSeconds / readme.vectoriseSeconds),
    },
    denseBaseline: await runDenseBaseline(train),
    latency: benchLatency(ours2.model, test),
    size: benchSize(ours2.model),
  };
  process.stdout.write(JSON.stringify(report, null, 2) + "\n");
}

void main();
