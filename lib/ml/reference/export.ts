// Exchange with the scikit-learn reference scripts in this folder: writes our CSR matrices and
// settings as JSON (numbers in shortest round-trip form, so Python reads the exact doubles), runs
// Debian's /usr/bin/python3 (the pyenv `python3` on PATH has no scikit-learn) and parses its JSON.
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { CsrMatrix } from "../csr";

export const SYSTEM_PYTHON = "/usr/bin/python3";

/** The CSR arrays as plain JSON lists. */
export function exportCsr(x: CsrMatrix): Record<string, number | number[]> {
  return { rows: x.rows, cols: x.cols, indptr: Array.from(x.indptr), indices: Array.from(x.indices), data: Array.from(x.data) };
}

/** Runs a reference script on a JSON spec and returns its parsed JSON output. */
export function runPythonReference<T>(script: string, spec: unknown): T {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "foldwright-ml-"));
  const file = path.join(dir, "spec.json");
  try {
    fs.writeFileSync(file, JSON.stringify(spec));
    const out = execFileSync(SYSTEM_PYTHON, [path.join(import.meta.dirname ?? __dirname, script), file], {
      encoding: "utf8",
      maxBuffer: 512 * 1024 * 1024,
    });
    return JSON.parse(out) as T;
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
