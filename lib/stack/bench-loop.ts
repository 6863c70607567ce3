// `npm run bench:loop`: the filing loop at office scale. 10,000 generated documents over 30
// cabinet types (synthetic texts from lib/demo) in a database of its own (foldwright_bench_loop),
// 9,500 of them filed by people. Prints the nightly retrain's wall time and peak memory, the
// suggestion latency per document (p50/p95, computing and storing), and the To review API
// latency for a page of 50 through a production build (p50/p95). Figures, not a test.
import crypto from "node:crypto";
import fs from "node:fs";
import { loadAverage, percentile } from "@/lib/stack/stats";
import { openScratchStack, runBench } from "@/lib/stack/scratch-stack";

process.env.DATABASE_NAME ??= "foldwright_bench_loop";
process.env.S3_BUCKET ??= "foldwright-bench";
process.env.PORT ??= "3201";
process.env.SESSION_SECRET ??= crypto.randomBytes(32).toString("hex");
process.env.SEED_DEMO_DOCUMENTS = "false";

const TOTAL = Number(process.argv[2] ?? 10_000);
const CLASSES = 30;
const UNFILED = Math.min(500, Math.floor(TOTAL / 20)); // 500 of 10,000; fewer in a quick run


function peakRssMb(): number {
  return Number(/VmHWM:\s+(\d+)/.exec(fs.readFileSync("/proc/self/status", "utf8"))![1]) / 1024;
}

async function main(): Promise<void> {
  const stack = await openScratchStack();
  const { env } = stack;
  const { getDb } = await import("@/db");
  const { generateSyntheticTexts } = await import("@/lib/demo/synthetic-texts");
  const db = getDb();
  try {
    console.log(`Generating ${TOTAL} documents over ${CLASSES} cabinet types …`);
    const labels = Array.from({ length: CLASSES }, (_, k) => `Bench cabinet ${String(k + 1).padStart(2, "0")}`);
    await db("cabinet_types").update({ active: false });
    for (const name of labels) {
      await db("cabinet_types").insert({ name, description: `Generated cabinet type ${name}.`, keywords: "[]", retention_years: 7, retention_trigger: "after_filing", retention_source: "Benchmark only." });
    }
    const typeId = new Map((await db("cabinet_types").whereIn("name", labels).select("id", "name")).map((t) => [t.name, t.id]));
    const clerk = (await db("users").where({ email: "clerk@example.com" }).first("id")).id;
    const matter = (await db("matters").where({ number: "AQ-2026-0101" }).first("id")).id;
    const texts = generateSyntheticTexts({ count: TOTAL, classes: labels, seed: 7 });
    const rows = texts.map((t, i) => ({
      sha256: crypto.createHash("sha256").update(`${i}:${t.text}`).digest("hex"),
      original_name: `bench-${i}.pdf`,
      media_type: "application/pdf",
      size_bytes: t.text.length,
      storage_key: `bench/${i}`,
      status: "ready",
      text: t.text,
      page_count: 1,
      char_count: t.text.length,
      uploaded_by: clerk,
      ...(i < TOTAL - UNFILED ? { cabinet_type_id: typeId.get(t.label), matter_id: matter, filed_by: clerk, filed_at: new Date(), filed_how: "by_hand" } : {}),
    }));
    for (let i = 0; i < rows.length; i += 500) await db("documents").insert(rows.slice(i, i + 500));

    console.log("Retraining (the nightly run, one thread) …");
    const { trainNow } = await import("@/lib/learning/retrain");
    const { getModelVersion } = await import("@/lib/data/models");
    const { FOLDWRIGHT } = await import("@/lib/data/users");
    const rssBefore = process.memoryUsage().rss / 1048576;
    const t0 = performance.now();
    const version = await getModelVersion(FOLDWRIGHT, await trainNow("manual"));
    const retrainSeconds = (performance.now() - t0) / 1000;
    const peak = peakRssMb();

    console.log("Suggesting for the unfiled documents …");
    const { findDocumentForSuggestion, saveSuggestion } = await import("@/lib/data/suggestions");
    const { computeSuggestion } = await import("@/lib/learning/suggest");
    const unfiled: number[] = await db("documents").whereNull("filed_at").pluck("id");
    const suggestMs: number[] = [];
    for (const id of unfiled) {
      const s = performance.now();
      const doc = await findDocumentForSuggestion(id);
      await saveSuggestion(null, null, await computeSuggestion(doc!));
      suggestMs.push(performance.now() - s);
    }

    console.log("Timing GET /api/review?pageSize=50 on a production build …");
    const { buildApp, serveApp } = await import("@/lib/stack/app-server");
    await buildApp(".next");
    const server = await serveApp({ distDir: ".next", port: env.port, quiet: true, env: { JOBS_ENABLED: "false", DATABASE_NAME: env.db.name } });
    const queueMs: number[] = [];
    try {
      const res = await fetch(`${server.url}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json", origin: server.url }, body: JSON.stringify({ email: "clerk@example.com", password: env.demoPassword }) });
      const cookie = res.headers.getSetCookie()[0].split(";")[0];
      const variants = ["sort=age&dir=asc", "sort=confidence&dir=desc", "sort=cabinet&dir=asc", "sort=age&dir=asc&page=5", "sort=confidence&dir=asc&minConfidence=0.5"];
      for (let i = 0; i < 5; i++) await fetch(`${server.url}/api/review?pageSize=50`, { headers: { cookie } }); // warm-up
      for (let i = 0; i < 200; i++) {
        const s = performance.now();
        const r = await fetch(`${server.url}/api/review?pageSize=50&${variants[i % variants.length]}`, { headers: { cookie } });
        await r.json();
        if (r.status !== 200) throw new Error(`GET /api/review answered ${r.status}`);
        queueMs.push(performance.now() - s);
      }
    } finally {
      await server.stop();
    }

    console.log(
      JSON.stringify(
        {
          documents: TOTAL,
          cabinetTypes: CLASSES,
          retrain: {
            trainedOn: version.trainCount,
            status: version.status,
            heldOutMacroF1: version.macroF1, // from 5,000 documents on, a stratified hold-out (lib/learning/evaluate-candidate.ts)
            accuracy: version.accuracy,
            vocabulary: version.vocabularySize,
            wallSeconds: +retrainSeconds.toFixed(1),
            peakRssMb: Math.round(peak),
            rssBeforeMb: Math.round(rssBefore),
          },
          suggestion: { documents: suggestMs.length, p50Ms: +percentile(suggestMs, 50).toFixed(1), p95Ms: +percentile(suggestMs, 95).toFixed(1) },
          reviewQueuePageOf50: { requests: queueMs.length, p50Ms: +percentile(queueMs, 50).toFixed(1), p95Ms: +percentile(queueMs, 95).toFixed(1) },
          goals: "suggestion p95 < 50 ms; queue page p95 < 150 ms; retrain < 60 s and < 1.5 GB",
          machine: { loadavg: loadAverage() },
        },
        null,
        2,
      ),
    );
  } finally {
    await stack.close();
  }
}

runBench(main);
