import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { REPO_ROOT } from "./helpers";

// Runs the command line exactly as `npm run classifier` does (tsx), so the tsx path of the
// worker threads is exercised too.
const TSX = path.join(REPO_ROOT, "node_modules/.bin/tsx");
const fixture = (name: string) => path.join(REPO_ROOT, "tests/fixtures/ml", name);

function runCli(...args: string[]) {
  const r = spawnSync(TSX, ["lib/ml/cli.ts", ...args], { cwd: REPO_ROOT, encoding: "utf8" });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe("classifier command line", () => {
  it("trains, predicts and evaluates on a tiny data set", () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "fw-cli-"));
    const modelPath = path.join(dir, "model.bin");
    const predsPath = path.join(dir, "preds.jsonl");
    const train = runCli("train", "--train", fixture("tiny.jsonl"), "--out", modelPath, "--min-df", "1", "--threads", "2");
    expect(train.stderr).toBe("");
    expect(train.status).toBe(0);
    expect(JSON.parse(train.stdout).classes).toBe(3);
    const predict = runCli("predict", "--model", modelPath, "--in", fixture("tiny.jsonl"), "--out", predsPath);
    expect(predict.status).toBe(0);
    const lines = fs.readFileSync(predsPath, "utf8").trim().split("\n").map((l) => JSON.parse(l));
    expect(lines).toHaveLength(9);
    for (const l of lines) {
      expect(l.top3).toHaveLength(3);
      expect(l.label).toBe(l.top3[0].label);
    }
    const evaluate = runCli("evaluate", "--data", fixture("tiny.jsonl"), "--folds", "3", "--min-df", "1");
    expect(evaluate.status).toBe(0);
    const report = JSON.parse(evaluate.stdout);
    expect(report.perClass).toHaveLength(3);
    expect(Object.keys(report.timings).sort()).toEqual(["fitMs", "predictMs", "vectoriseMs"]);
    fs.rmSync(dir, { recursive: true, force: true });
  }, 60_000);

  it.each([
    ["a missing file", ["evaluate", "--data", "/nonexistent/x.jsonl"], /x\.jsonl: cannot read the file \(no such file\)/],
    ["a line that is not JSON", ["train", "--train", fixture("bad-json.jsonl"), "--out", "/tmp/x.bin"], /bad-json\.jsonl line 3: not valid JSON/],
    ["a line with no text", ["evaluate", "--data", fixture("no-text.jsonl")], /no-text\.jsonl line 2: no "text" string/],
    ["a single class", ["evaluate", "--data", fixture("one-class.jsonl")], /one-class\.jsonl: all 2 documents have the label "x"/],
    ["an empty file", ["evaluate", "--data", fixture("empty.jsonl")], /empty\.jsonl: the file holds no documents/],
    ["a bad number", ["evaluate", "--data", fixture("tiny.jsonl"), "--C", "lots"], /--C must be a number/],
  ])("rejects %s with one line and exit status 2", (_, args, message) => {
    const r = runCli(...args);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stdout).toBe("");
  }, 30_000);
});
