// Command line for offices and for evaluation on any JSON-lines data set:
//   classifier evaluate --train A.jsonl --test B.jsonl [--C 10]
//   classifier evaluate --data A.jsonl --folds 5 [--seed 42]
//   classifier train --train A.jsonl --out model.bin [--folds 5]
//   classifier predict --model model.bin --in B.jsonl --out preds.jsonl
// Common options: --C, --min-df, --max-df, --max-features, --balanced, --threads, --floor,
// --target. Labels are read as the cabinet types' names and used as the product uses types'
// names (model-features.ts), so evaluate measures what the product serves. Results are JSON on stdout; bad input is one line on stderr and exit status 2.
import fs from "node:fs";
import { parseArgs } from "node:util";
import { crossValidate, evaluateSplit, type EvaluationOptions } from "./evaluate";
import { InputError, readJsonl, readTrainingJsonl } from "./jsonl";
import { loadModel, saveModel } from "./artifact";
import { predictDocuments, trainModel } from "./model";
import { priorsFromLabels } from "./model-features";
import type { LabelledDocument } from "./types";

const USAGE = "usage: classifier evaluate|train|predict [options] (see lib/ml/cli.ts)";

type Values = Record<string, string | boolean | undefined>;

/** Reads a numeric option, or explains what is wrong with it. */
function readNumber(values: Values, name: string): number | undefined {
  const raw = values[name];
  if (raw === undefined) return undefined;
  const n = Number(raw);
  if (typeof raw !== "string" || raw.trim() === "" || !Number.isFinite(n)) throw new InputError(`--${name} must be a number, got "${String(raw)}".`);
  return n;
}

/** Requires a string option. */
function requireOption(values: Values, name: string): string {
  const v = values[name];
  if (typeof v !== "string" || v === "") throw new InputError(`--${name} is required. ${USAGE}`);
  return v;
}

/** Model options from the command line. */
function readOptions(values: Values): EvaluationOptions {
  const tfidf: Record<string, number> = {};
  const minDf = readNumber(values, "min-df");
  const maxDf = readNumber(values, "max-df");
  const maxFeatures = readNumber(values, "max-features");
  if (minDf !== undefined) tfidf.minDf = minDf;
  if (maxDf !== undefined) tfidf.maxDf = maxDf;
  if (maxFeatures !== undefined) tfidf.maxFeatures = maxFeatures;
  return {
    C: readNumber(values, "C"),
    threads: readNumber(values, "threads"),
    floor: readNumber(values, "floor"),
    precisionTarget: readNumber(values, "target"),
    seed: readNumber(values, "seed"),
    balanced: values.balanced === true ? true : undefined,
    tfidf,
  };
}

/** The product's priors: here the labels are the cabinet types' names. */
function withPriors(options: EvaluationOptions, docs: LabelledDocument[]): EvaluationOptions {
  return { ...options, priors: priorsFromLabels(docs.map((d) => d.label)) };
}

/** Runs one command; returns what to print on stdout. */
async function runCommand(command: string, values: Values): Promise<unknown> {
  let options = readOptions(values);
  if (command === "evaluate") {
    if (values.data !== undefined) {
      const folds = readNumber(values, "folds") ?? 5;
      const docs = readTrainingJsonl(requireOption(values, "data"));
      return crossValidate(docs, folds, withPriors(options, docs));
    }
    const train = readTrainingJsonl(requireOption(values, "train"));
    return evaluateSplit(train, readJsonl(requireOption(values, "test"), true), withPriors(options, train));
  }
  if (command === "train") {
    const train = readTrainingJsonl(requireOption(values, "train"));
    options = withPriors(options, train);
    const out = requireOption(values, "out");
    const folds = readNumber(values, "folds");
    const model = await trainModel(train, options);
    if (folds !== undefined) model.metrics = await crossValidate(train, folds, options);
    fs.writeFileSync(out, saveModel(model));
    return { model: out, classes: model.classes.length, terms: model.terms.length, documents: train.length, timings: model.timings, bytes: fs.statSync(out).size };
  }
  if (command === "predict") {
    const modelPath = requireOption(values, "model");
    let bytes: Buffer;
    try {
      bytes = fs.readFileSync(modelPath);
    } catch {
      throw new InputError(`${modelPath}: cannot read the model file.`);
    }
    const model = loadModel(new Uint8Array(bytes));
    const docs = readJsonl(requireOption(values, "in"), false);
    const lines = predictDocuments(model, docs).map((p) =>
      JSON.stringify({
        label: p.label,
        confidence: p.confidence,
        noConfidentMatch: p.noConfidentMatch,
        top3: p.ranked.slice(0, 3).map((r) => ({ label: r.label, confidence: r.confidence, probability: r.probability })),
        why: p.why.map((w) => w.term),
      }),
    );
    const out = requireOption(values, "out");
    fs.writeFileSync(out, lines.join("\n") + "\n");
    return { predictions: lines.length, out };
  }
  throw new InputError(`Unknown command "${command}". ${USAGE}`);
}

/** Entry point: parse, run, print; exit 2 on bad input, 1 on anything else. */
async function main(): Promise<void> {
  try {
    const options: Record<string, { type: "string" | "boolean" }> = { balanced: { type: "boolean" } };
    for (const name of ["train", "test", "data", "out", "model", "in", "folds", "seed", "C", "min-df", "max-df", "max-features", "threads", "floor", "target"]) {
      options[name] = { type: "string" };
    }
    const { positionals, values } = parseArgs({ allowPositionals: true, options });
    if (positionals.length !== 1) throw new InputError(USAGE);
    const result = await runCommand(positionals[0], values as Values);
    process.stdout.write(JSON.stringify(result, null, 2) + "\n");
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    const isInput = err instanceof InputError || (err instanceof TypeError && "code" in err && String(err.code).startsWith("ERR_PARSE_ARGS"));
    process.stderr.write(`error: ${message.split("\n")[0]}\n`);
    process.exitCode = isInput ? 2 : 1;
  }
}

void main();
