// `npm run bench:scale -- 100000`: a bigger office. N generated documents (synthetic texts from
// lib/demo) over 40 cabinet types and 40 matters (4 of them restricted, the clerk on the team of
// 2), in a database and bucket of their own (foldwright_bench_scale). Each is tokenised once and
// its counts stored (lib/data/document-terms.ts), filed with its "filed_by_hand" event through
// lib/data/record.ts, a batch at a time — no files, no OCR. Then it measures, in this order:
// Cabinets, a search and History pages over HTTP on a production build (p50/p95, as the clerk or
// the auditor: inside the wall's checks); the filing record's CSV export of every event (time,
// and the web server's memory while it streams); the nightly retraining (wall time, peak memory
// of this process during it, from stored counts); suggestions for the unfiled documents (compute
// and store); the To review page, which needs them. Each figure is logged as it is measured. Prints a table, then the figures as one JSON object on the last line.
// Figures, not a test.
import crypto from "node:crypto";
import fs from "node:fs";
import { loadAverage, percentile } from "@/lib/stack/stats";
import { openScratchStack, runBench } from "@/lib/stack/scratch-stack";

process.env.DATABASE_NAME ??= "foldwright_bench_scale";
process.env.S3_BUCKET ??= "foldwright-bench-scale";
process.env.PORT ??= "3202";
process.env.SESSION_SECRET ??= crypto.randomBytes(32).toString("hex");
process.env.SEED_DEMO_DOCUMENTS = "false";

const TOTAL = Number(process.argv[2] ?? 10_000);
if (!Number.isInteger(TOTAL) || TOTAL < 1_000) {
  console.error("Give the number of documents, a whole number of at least 1000: npm run bench:scale -- 100000");
  process.exit(2);
}
const TYPES = 40;
const MATTERS = 40;
const RESTRICTED = 4; // the first four matters; the clerk is on the team of the first two
const UNFILED = Math.min(500, Math.floor(TOTAL / 20));
const BATCH = 1_000;
const REQUESTS = 60; // per page

const mb = (kb: number) => kb / 1024;
function statusField(pid: number | "self", field: "VmHWM" | "VmRSS"): number {
  return mb(Number(new RegExp(`${field}:\\s+(\\d+)`).exec(fs.readFileSync(`/proc/${pid}/status`, "utf8"))![1]));
}
/** Resets this process's peak resident memory (Linux: writing 5 to clear_refs). */
function resetPeak(): void {
  fs.writeFileSync("/proc/self/clear_refs", "5");
}

const round = (v: number, d = 1) => +v.toFixed(d);

async function main(): Promise<void> {
  const stack = await openScratchStack();
  const { env } = stack;
  const { getDb } = await import("@/db");
  const { generateSyntheticTexts } = await import("@/lib/demo/synthetic-texts");
  const { storeTerms, termsRowOf } = await import("@/lib/data/document-terms");
  const { appendFilingEvents } = await import("@/lib/data/record");
  const db = getDb();
  const figures: Record<string, unknown> = { documents: TOTAL, cabinetTypes: TYPES, matters: MATTERS };
  try {
    // ---- the office
    const labels = Array.from({ length: TYPES }, (_, k) => `Scale cabinet ${String(k + 1).padStart(2, "0")}`);
    await db("cabinet_types").update({ active: false });
    for (const name of labels) {
      await db("cabinet_types").insert({ name, description: `Generated cabinet type ${name}.`, keywords: "[]", retention_years: 7, retention_trigger: "after_filing", retention_source: "Benchmark only." });
    }
    const typeId = new Map((await db("cabinet_types").whereIn("name", labels).select("id", "name")).map((t) => [t.name, Number(t.id)]));
    const [clientId] = await db("clients").insert({ name: "Scale Benchmark Holdings", aliases: "[]", email_domains: "[]" });
    const matterIds: number[] = [];
    for (let k = 0; k < MATTERS; k++) {
      const [id] = await db("matters").insert({ client_id: clientId, number: `SC-2026-${String(k + 1).padStart(4, "0")}`, title: `Scale matter ${k + 1}`, restricted: k < RESTRICTED, opened_on: "2023-01-02" });
      matterIds.push(Number(id));
    }
    const clerk = Number((await db("users").where({ email: "clerk@example.com" }).first("id")).id);
    await db("matter_members").insert([{ matter_id: matterIds[0], user_id: clerk }, { matter_id: matterIds[1], user_id: clerk }]);

    // ---- generate, tokenise once, file (a batch at a time)
    console.log(`Generating ${TOTAL} documents over ${TYPES} cabinet types and ${MATTERS} matters …`);
    let t = performance.now();
    const texts = generateSyntheticTexts({ count: TOTAL, classes: labels, seed: 7 });
    const generateSeconds = (performance.now() - t) / 1000;
    const start = Date.now() - TOTAL * 60_000; // one document a minute, oldest first
    let tokenizeMs = 0;
    t = performance.now();
    for (let from = 0; from < TOTAL; from += BATCH) {
      const slice = texts.slice(from, from + BATCH);
      const rows = slice.map((d, j) => {
        const i = from + j;
        const at = new Date(start + i * 60_000);
        const filed = i < TOTAL - UNFILED;
        return {
          sha256: crypto.createHash("sha256").update(`${i}:${d.text}`).digest("hex"),
          original_name: `scale-${i}.pdf`,
          media_type: "application/pdf",
          size_bytes: d.text.length,
          storage_key: `scale/${i}`,
          status: "ready",
          text: d.text,
          page_count: 1,
          char_count: d.text.length,
          uploaded_by: clerk,
          uploaded_at: at,
          read_at: at,
          ...(filed ? { cabinet_type_id: typeId.get(d.label), matter_id: matterIds[i % MATTERS], filed_by: clerk, filed_at: at, filed_how: "by_hand" } : {}),
        };
      });
      await db.transaction(async (trx) => {
        await trx("documents").insert(rows);
        const ids: { id: number; original_name: string }[] = await trx("documents").whereIn("sha256", rows.map((r) => r.sha256)).select("id", "original_name");
        const idOf = new Map(ids.map((r) => [r.original_name, Number(r.id)]));
        const s = performance.now();
        const terms = rows.map((r) => termsRowOf(idOf.get(r.original_name)!, { text: r.text, original_name: r.original_name, media_type: r.media_type, page_count: 1, ocr_used: 0 }));
        tokenizeMs += performance.now() - s;
        for (let k = 0; k < terms.length; k += 250) await storeTerms(terms.slice(k, k + 250), trx);
        const filedRows = rows.filter((r) => r.filed_at);
        await appendFilingEvents(
          trx,
          filedRows.map((r) => ({ documentId: idOf.get(r.original_name)!, userId: clerk, action: "filed_by_hand" as const, toCabinetTypeId: r.cabinet_type_id, toMatterId: r.matter_id, reason: "Filed by the scale benchmark.", createdAt: r.filed_at })),
        );
      });
      if ((from / BATCH) % 10 === 9) console.log(`  ${from + BATCH} filed`);
    }
    const fileSeconds = (performance.now() - t) / 1000;
    figures.generateSeconds = round(generateSeconds);
    figures.fileSeconds = round(fileSeconds);
    figures.tokenizeOnceSeconds = round(tokenizeMs / 1000);
    texts.length = 0;

    // ---- pages over HTTP on a production build
    console.log("Building and serving the app …");
    const { buildApp, serveApp } = await import("@/lib/stack/app-server");
    await buildApp(".next");
    const server = await serveApp({ distDir: ".next", port: env.port, quiet: true, env: { JOBS_ENABLED: "false", DATABASE_NAME: env.db.name, S3_BUCKET: env.s3.bucket } });
    try {
      const signIn = async (email: string) => {
        const res = await fetch(`${server.url}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email, password: env.demoPassword }) });
        if (res.status !== 200) throw new Error(`Signing in as ${email} answered ${res.status}`);
        return res.headers.getSetCookie()[0].split(";")[0];
      };
      const cookies = { clerk: await signIn("clerk@example.com"), auditor: await signIn("auditor@example.com") };
      // A word of the generated texts that is in most documents' cabinet: the search finds many.
      const word = String((await db("documents").whereNotNull("text").orderBy("id").first("text")).text).split(/\W+/).find((w: string) => w.length >= 6) ?? "document";
      const reviewPage = { name: "To review", who: "clerk" as const, paths: ["/review", "/review?sort=confidence&dir=desc", "/review?page=3"] };
      const pages: { name: string; who: keyof typeof cookies; paths: string[] }[] = [
        { name: "Cabinets", who: "clerk", paths: ["/cabinets", `/cabinets?matter=${matterIds[5]}`, `/cabinets?matter=${matterIds[6]}&cabinetType=${typeId.get(labels[3])}`, "/cabinets?page=40"] },
        { name: "Search", who: "clerk", paths: [`/cabinets?q=${encodeURIComponent(word)}`, `/cabinets?q=${encodeURIComponent(word.slice(0, 4))}`] },
        { name: "History", who: "auditor", paths: ["/history", "/history?action=filed_by_hand", "/history?action=suggested", "/history?page=20"] },
      ];
      const pageFigures: Record<string, { p50Ms: number; p95Ms: number; requests: number }> = {};
      const timePage = async (page: { name: string; who: keyof typeof cookies; paths: string[] }) => {
        const cookie = cookies[page.who];
        for (const path of page.paths) await (await fetch(`${server.url}${path}`, { headers: { cookie } })).text(); // warm-up
        const ms: number[] = [];
        for (let i = 0; i < REQUESTS; i++) {
          const path = page.paths[i % page.paths.length];
          const s = performance.now();
          const r = await fetch(`${server.url}${path}`, { headers: { cookie } });
          await r.text();
          if (r.status !== 200) throw new Error(`GET ${path} answered ${r.status}`);
          ms.push(performance.now() - s);
        }
        pageFigures[page.name] = { p50Ms: round(percentile(ms, 50)), p95Ms: round(percentile(ms, 95)), requests: ms.length };
        console.log(`  ${page.name}: p50 ${pageFigures[page.name].p50Ms} ms, p95 ${pageFigures[page.name].p95Ms} ms`);
      };
      for (const page of pages) await timePage(page);
      figures.cabinetsP50Ms = pageFigures.Cabinets.p50Ms;
      figures.cabinetsP95Ms = pageFigures.Cabinets.p95Ms;
      figures.searchP50Ms = pageFigures.Search.p50Ms;
      figures.searchP95Ms = pageFigures.Search.p95Ms;
      figures.historyP50Ms = pageFigures.History.p50Ms;
      figures.historyP95Ms = pageFigures.History.p95Ms;
      figures.searchWord = word;

      // ---- the CSV export of the whole record, as the auditor (admins would skip the wall)
      console.log("Exporting the filing record as CSV …");
      const pid = server.child.pid!;
      const serverBefore = statusField(pid, "VmRSS");
      let serverPeak = serverBefore;
      const sampler = setInterval(() => (serverPeak = Math.max(serverPeak, statusField(pid, "VmRSS"))), 25);
      const s = performance.now();
      const res = await fetch(`${server.url}/api/filing-events?format=csv`, { headers: { cookie: cookies.auditor } });
      if (res.status !== 200) throw new Error(`The CSV export answered ${res.status}`);
      let bytes = 0;
      let lines = 0;
      for await (const chunk of res.body as unknown as AsyncIterable<Uint8Array>) {
        bytes += chunk.length;
        for (let k = 0; k < chunk.length; k++) if (chunk[k] === 10) lines++;
      }
      clearInterval(sampler);
      figures.csvSeconds = round((performance.now() - s) / 1000, 2);
      figures.csvRows = lines - 1;
      figures.csvMB = round(bytes / 1048576);
      figures.csvServerRssBeforeMB = Math.round(serverBefore);
      figures.csvServerPeakMB = Math.round(serverPeak);
      figures.csvServerGrowthMB = Math.round(serverPeak - serverBefore);
      console.log(`  CSV: ${figures.csvRows} rows in ${figures.csvSeconds} s, server ${figures.csvServerRssBeforeMB} → ${figures.csvServerPeakMB} MB`);

      // ---- the nightly (the server idles meanwhile; it is another process) retraining, from stored counts
      console.log("Retraining (the nightly run, one thread, from stored term counts) …");
      const { trainNow } = await import("@/lib/learning/retrain");
      const { getModelVersion } = await import("@/lib/data/models");
      const { FOLDWRIGHT } = await import("@/lib/data/users");
      (globalThis as { gc?: () => void }).gc?.();
      const rssBefore = statusField("self", "VmRSS");
      resetPeak();
      t = performance.now();
      const version = await getModelVersion(FOLDWRIGHT, await trainNow("manual"));
      figures.retrainSeconds = round((performance.now() - t) / 1000);
      figures.retrainPeakMB = Math.round(statusField("self", "VmHWM"));
      figures.retrainRssBeforeMB = Math.round(rssBefore);
      figures.retrain = { status: version.status, trainedOn: version.trainCount, vocabulary: version.vocabularySize, heldOutMacroF1: version.macroF1, accuracy: version.accuracy };
      if (version.status !== "current") throw new Error(`The retraining did not promote a model: ${version.status} ${version.reason ?? ""}`);

      // ---- suggestions for the unfiled documents
      console.log(`Suggesting for the ${UNFILED} unfiled documents …`);
      const { findDocumentForSuggestion, saveSuggestion } = await import("@/lib/data/suggestions");
      const { computeSuggestion } = await import("@/lib/learning/suggest");
      const unfiled: number[] = await db("documents").whereNull("filed_at").orderBy("id").pluck("id");
      const suggestMs: number[] = [];
      for (const id of unfiled) {
        const s = performance.now();
        const doc = await findDocumentForSuggestion(id);
        await saveSuggestion(null, null, await computeSuggestion(doc!));
        suggestMs.push(performance.now() - s);
      }
      figures.suggestP50Ms = round(percentile(suggestMs, 50));
      figures.suggestP95Ms = round(percentile(suggestMs, 95));
      figures.events = Number((await db("filing_events").count({ n: "*" }))[0].n);

      console.log(`  retrain ${figures.retrainSeconds} s, peak ${figures.retrainPeakMB} MB; suggestions p50 ${figures.suggestP50Ms} ms, p95 ${figures.suggestP95Ms} ms`);
      await timePage(reviewPage);
      figures.reviewP50Ms = pageFigures["To review"].p50Ms;
      figures.reviewP95Ms = pageFigures["To review"].p95Ms;
    } finally {
      await server.stop();
    }
    figures.loadavg = loadAverage();

    const rows: [string, string, string][] = [
      ["nightly retrain", `${figures.retrainSeconds} s, peak ${figures.retrainPeakMB} MB (${(figures.retrain as { trainedOn: number }).trainedOn} documents)`, TOTAL >= 100_000 ? "< 60 s, < 1.5 GB" : TOTAL <= 10_000 ? "< 15 s" : ""],
      ["suggestion (compute + store)", `p50 ${figures.suggestP50Ms} ms, p95 ${figures.suggestP95Ms} ms`, "p95 < 30 ms"],
      ["To review page", `p50 ${figures.reviewP50Ms} ms, p95 ${figures.reviewP95Ms} ms`, "p95 < 150 ms"],
      ["Cabinets page", `p50 ${figures.cabinetsP50Ms} ms, p95 ${figures.cabinetsP95Ms} ms`, "p95 < 150 ms"],
      ["search (Cabinets ?q=)", `p50 ${figures.searchP50Ms} ms, p95 ${figures.searchP95Ms} ms`, "p95 < 150 ms"],
      ["History page", `p50 ${figures.historyP50Ms} ms, p95 ${figures.historyP95Ms} ms`, "p95 < 150 ms"],
      ["CSV export", `${figures.csvRows} events, ${figures.csvMB} MB in ${figures.csvSeconds} s; server +${figures.csvServerGrowthMB} MB (from ${figures.csvServerRssBeforeMB})`, "memory flat"],
      ["filing the set", `${figures.fileSeconds} s (tokenising once: ${figures.tokenizeOnceSeconds} s)`, ""],
    ];
    console.log(`\n${TOTAL} documents, ${TYPES} cabinet types, ${MATTERS} matters (load ${figures.loadavg})`);
    console.log("| measure | figure | goal |\n|---|---|---|");
    for (const [a, b, c] of rows) console.log(`| ${a} | ${b} | ${c} |`);
    console.log(JSON.stringify(figures));
  } finally {
    await stack.close();
  }
}

runBench(main);
