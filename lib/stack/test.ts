// `npm test`: lint, type-check, then the Vitest projects one after another (unit, integration
// against the real MariaDB and S3 fake, e2e against the built app in Chromium), and a closing
// line "N passed, N failed". Projects run in turn because integration and e2e tests share the
// demo accounts of the test database.
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

const root = process.cwd();
const bin = (name: string) => path.join(root, "node_modules/.bin", name);
const resultsDir = path.join(root, ".data/test-results");
fs.mkdirSync(resultsDir, { recursive: true });

function step(title: string, cmd: string, args: string[]): boolean {
  console.log(`\n=== ${title} ===`);
  const t0 = Date.now();
  const r = spawnSync(cmd, args, { stdio: "inherit", env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", FORCE_COLOR: "0" } });
  console.log(`--- ${title}: ${r.status === 0 ? "ok" : "FAILED"} (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
  return r.status === 0;
}

const only = process.argv.slice(2).filter((a) => !a.startsWith("-"));
const projects = only.length ? only : ["unit", "integration", "e2e"];
let passed = 0;
let failed = 0;
let ok = true;

if (!only.length) {
  const lint = step("lint (eslint)", bin("eslint"), [".", "--max-warnings=0"]);
  const types = step("type-check (tsc)", bin("tsc"), ["--noEmit", "-p", "."]);
  // Lint and type-check are not tests: they count only when they fail.
  failed += Number(!lint) + Number(!types);
  ok = lint && types;
}

for (const project of projects) {
  const out = path.join(resultsDir, `${project}.json`);
  fs.rmSync(out, { force: true });
  const ran = step(`tests: ${project}`, bin("vitest"), ["run", "--project", project, "--reporter=default", "--reporter=json", `--outputFile.json=${out}`]);
  ok &&= ran;
  if (fs.existsSync(out)) {
    const r = JSON.parse(fs.readFileSync(out, "utf8"));
    passed += r.numPassedTests;
    failed += r.numFailedTests;
    if (r.numTotalTests === 0) {
      console.log(`No tests ran in project ${project}.`);
      ok = false;
    }
  } else {
    failed += 1; // the project could not even start
  }
}

console.log(`\n${passed} passed, ${failed} failed`);
process.exit(ok && failed === 0 ? 0 : 1);
