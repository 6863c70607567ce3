// `npm run bench:few -- [SPLITS.json]`: the small-office learning curve of
// ../shared/data/cuad-contracts (CUAD v1, The Atticus Project, CC BY 4.0): for every k and draw of
// its splits.json, our product model (lib/ml defaults: heading block, the types' names as priors)
// is trained on the draw and tested on `test`; top-1, top-3 and macro-F1 per k, the mean of the
// draws, beside scikit-learn's two reference pipelines from that folder's README (body only;
// body + heading block), run in the same command through /usr/bin/python3. Prints a table and, as
// its last line, one JSON object of the figures. Asserts nothing.
import fs from "node:fs";
import path from "node:path";
import { computeMetrics } from "./metrics";
import { predictDocuments, trainModel } from "./model";
import { priorsFromLabels } from "./model-features";
import { runPythonReference } from "./reference/export";
import type { LabelledDocument } from "./types";

type Figures = { top1: number; top3: number; macroF1: number };

const splitsPath = path.resolve(process.argv[2] ?? path.resolve(import.meta.dirname ?? __dirname, "../../../shared/data/cuad-contracts/splits.json"));
const contractsPath = path.join(path.dirname(splitsPath), "contracts.jsonl");
const round = (v: number) => Math.round(v * 1000) / 1000;

async function main(): Promise<void> {
  if (!fs.existsSync(splitsPath) || !fs.existsSync(contractsPath)) {
    throw new Error(`${splitsPath} or contracts.jsonl beside it is missing: pass the splits.json of cuad-contracts.`);
  }
  const docs = new Map<string, LabelledDocument>();
  for (const line of fs.readFileSync(contractsPath, "utf8").split("\n")) {
    if (!line.trim()) continue;
    const d = JSON.parse(line) as { text: string; label: string; pdf: string };
    docs.set(d.pdf, { text: d.text, label: d.label });
  }
  const splits = JSON.parse(fs.readFileSync(splitsPath, "utf8")) as { test: string[]; train: Record<string, string[]> };
  const test = splits.test.map((p) => docs.get(p)!);
  const ours: Record<string, Figures & { fitSeconds: number }> = {};
  for (const [name, keys] of Object.entries(splits.train)) {
    const train = keys.map((p) => docs.get(p)!);
    const model = await trainModel(train, { priors: priorsFromLabels(train.map((d) => d.label)) });
    const preds = predictDocuments(model, test, 0);
    const id = new Map(model.classes.map((c, k) => [c, k]));
    const m = computeMetrics(model.classes, test.map((d) => id.get(d.label)!), preds.map((p) => p.ranked.map((r) => id.get(r.label)!)));
    ours[name] = { top1: m.accuracy, top3: m.top3Accuracy, macroF1: m.macroF1, fitSeconds: model.timings.fitMs / 1000 };
    process.stderr.write(`${name}: top-1 ${m.accuracy.toFixed(3)} top-3 ${m.top3Accuracy.toFixed(3)} macro-F1 ${m.macroF1.toFixed(3)}\n`);
  }
  const sk = runPythonReference<Record<string, { body: Figures; bodyHeading: Figures }>>("sklearn_few.py", { contracts: contractsPath, splits: splitsPath });
  const ks = [...new Set(Object.keys(splits.train).map((n) => Number(/^k(\d+)_/.exec(n)![1])))].sort((a, b) => a - b);
  const mean = (rows: Figures[]) => ({ top1: round(rows.reduce((a, r) => a + r.top1, 0) / rows.length), top3: round(rows.reduce((a, r) => a + r.top3, 0) / rows.length), macroF1: round(rows.reduce((a, r) => a + r.macroF1, 0) / rows.length) });
  const curve = ks.map((k) => {
    const names = Object.keys(splits.train).filter((n) => n.startsWith(`k${k}_`));
    return { k, draws: names.length, ours: mean(names.map((n) => ours[n])), sklearnBody: mean(names.map((n) => sk[n].body)), sklearnBodyHeading: mean(names.map((n) => sk[n].bodyHeading)) };
  });
  const f = (x: Figures) => `${x.top1.toFixed(3)} | ${x.top3.toFixed(3)} | ${x.macroF1.toFixed(3)}`;
  console.log("| k | Foldwright top-1 | top-3 | macro-F1 | sklearn body top-1 | top-3 | macro-F1 | sklearn body+heading top-1 | top-3 | macro-F1 |");
  console.log("|---|---|---|---|---|---|---|---|---|---|");
  for (const c of curve) console.log(`| ${c.k} | ${f(c.ours)} | ${f(c.sklearnBody)} | ${f(c.sklearnBodyHeading)} |`);
  const k5 = curve.find((c) => c.k === 5);
  console.log(
    JSON.stringify({
      curve,
      goals: {
        k5Top1AtLeast085: k5 ? k5.ours.top1 >= 0.85 : null,
        k5Top3AtLeast095: k5 ? k5.ours.top3 >= 0.95 : null,
        aheadOfBodyHeadingEveryK: curve.every((c) => c.ours.top1 > c.sklearnBodyHeading.top1),
      },
    }),
  );
}

main().catch((err) => {
  process.stderr.write(`error: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exitCode = 1;
});
