// Shared helpers of the lib/ml tests: where the open data lives and how to reach scikit-learn.
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import type { LabelledDocument } from "@/lib/ml/types";
import { SYSTEM_PYTHON } from "@/lib/ml/reference/export";

export const REPO_ROOT = path.resolve(import.meta.dirname, "../../..");
/** CUAD v1 clause spans (The Atticus Project, CC BY 4.0), beside the repository as CI lays it out. */
export const CUAD_DIR = path.resolve(REPO_ROOT, "../shared/data/cuad-clauses");

/** Reads a CUAD split ("train" or "test"). */
export function readCuad(split: "train" | "test"): LabelledDocument[] {
  return fs
    .readFileSync(path.join(CUAD_DIR, `${split}.jsonl`), "utf8")
    .split("\n")
    .filter((l) => l.trim() !== "")
    .map((l) => {
      const r = JSON.parse(l) as { text: string; label: string };
      return { text: r.text, label: r.label };
    });
}

/** A reproducible slice: the `classes` most frequent labels of train, at most `perClass` each. */
export function sliceCuad(docs: LabelledDocument[], labels: string[], perClass: number): LabelledDocument[] {
  const taken = new Map<string, number>();
  return docs.filter((d) => {
    if (!labels.includes(d.label)) return false;
    const n = taken.get(d.label) ?? 0;
    taken.set(d.label, n + 1);
    return n < perClass;
  });
}

/** The most frequent labels, ties by name. */
export function mostFrequentLabels(docs: LabelledDocument[], count: number): string[] {
  const n = new Map<string, number>();
  for (const d of docs) n.set(d.label, (n.get(d.label) ?? 0) + 1);
  return [...n.entries()].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1)).slice(0, count).map(([l]) => l);
}

/** Fails loudly when Debian's python3-sklearn is missing (the project's test command installs it). */
export function requireSklearn(): string {
  try {
    return execFileSync(SYSTEM_PYTHON, ["-c", "import sklearn; print(sklearn.__version__)"], { encoding: "utf8" }).trim();
  } catch {
    throw new Error("Debian's python3-sklearn is missing: run `apt-get install -y python3-sklearn` (the test command does).");
  }
}
