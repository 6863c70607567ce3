// `npm run bench:intake`: uploads a mix of 200 generated documents through the real upload route
// of a production build, then reads them with one background worker on one core, and prints:
// uploads/s, p50/p95 upload latency (all files and the ~1 MB ones), reading time per text page
// and per OCR page, and the web server's memory over the run. Uses its own database and bucket
// (foldwright_bench) on the local servers and removes them afterwards. Figures, not a test.
import fs from "node:fs";
import { loadAverage, percentile } from "@/lib/stack/stats";
import { openScratchStack, runBench } from "@/lib/stack/scratch-stack";
import crypto from "node:crypto";
import { createCanvas } from "@napi-rs/canvas";
import PDFKit from "pdfkit";

process.env.DATABASE_NAME ??= "foldwright_bench";
process.env.S3_BUCKET ??= "foldwright-bench";
process.env.PORT ??= "3200";
process.env.SESSION_SECRET ??= crypto.randomBytes(32).toString("hex");
process.env.UPLOAD_MAX_BYTES ??= String(50 * 1024 * 1024);
process.env.SEED_DEMO_DOCUMENTS = "false"; // only the benchmark's own documents are measured

const TOTAL = Number(process.argv[2] ?? 200);
const WORDS = "agreement invoice statement notice payment balance account tenant landlord schedule clause period amount trustee minutes resolution".split(" ");

function paragraph(seed: number, words = 60): string {
  return Array.from({ length: words }, (_, i) => WORDS[(seed * 7 + i * 13) % WORDS.length]).join(" ");
}

function pdfkitBytes(build: (doc: PDFKit.PDFDocument) => void): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFKit({ size: "A4", margin: 56 });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    build(doc);
    doc.end();
  });
}

/** A text page plus an incompressible picture: about 1 MB, like a letter with a photo. */
async function megabytePdf(seed: number): Promise<Buffer> {
  const canvas = createCanvas(600, 560);
  const ctx = canvas.getContext("2d");
  const image = ctx.createImageData(600, 560);
  crypto.randomFillSync(image.data);
  for (let i = 3; i < image.data.length; i += 4) image.data[i] = 255;
  ctx.putImageData(image, 0, 0);
  const png = await canvas.encode("png");
  return pdfkitBytes((doc) => {
    doc.fontSize(12).text(`Exhibit ${seed}. ${paragraph(seed)}`);
    doc.image(png, { width: 400 });
  });
}

interface Sample {
  kind: "text-pdf" | "docx" | "mb-pdf" | "scan";
  name: string;
  bytes: Uint8Array;
}

async function makeSamples(): Promise<Sample[]> {
  const { makeDocx, makeTextPdf, renderTextPng } = await import("@/tests/helpers/make-files");
  const samples: Sample[] = [];
  for (let i = 0; i < TOTAL; i++) {
    const stamp = `${i}-${crypto.randomUUID()}`;
    const slot = i % 10;
    if (slot < 6) {
      const pages = Array.from({ length: 1 + (i % 4) }, (_, p) => [`Document ${stamp} page ${p + 1}`, paragraph(i + p), paragraph(i + p + 1)]);
      samples.push({ kind: "text-pdf", name: `letter-${i}.pdf`, bytes: await makeTextPdf(pages) });
    } else if (slot < 8) {
      samples.push({ kind: "docx", name: `memo-${i}.docx`, bytes: await makeDocx([`Memo ${stamp}`, paragraph(i), paragraph(i + 3)]) });
    } else if (slot === 8) {
      samples.push({ kind: "mb-pdf", name: `exhibit-${i}.pdf`, bytes: await megabytePdf(i) });
    } else {
      // A dense scanned page: 26 lines of about nine words, like a typed A4 letter.
      const lines = [`Notice ${stamp}`, ...Array.from({ length: 25 }, (_, l) => paragraph(i + l, 9))];
      samples.push({ kind: "scan", name: `scan-${i}.png`, bytes: await renderTextPng(lines) });
    }
  }
  return samples;
}


function rssMb(pid: number): number {
  const status = fs.readFileSync(`/proc/${pid}/status`, "utf8");
  return Number(/VmRSS:\s+(\d+)/.exec(status)![1]) / 1024;
}

async function main(): Promise<void> {
  const stack = await openScratchStack();
  const { env } = stack;
  const { buildApp, serveApp } = await import("@/lib/stack/app-server");
  await buildApp(".next");
  const server = await serveApp({ distDir: ".next", port: env.port, quiet: true, env: { JOBS_ENABLED: "false" } });
  const url = server.url;
  try {
    const signIn = await fetch(`${url}/api/auth/sign-in`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: url },
      body: JSON.stringify({ email: "clerk@example.com", password: env.demoPassword }),
    });
    const cookie = signIn.headers.getSetCookie()[0].split(";")[0];
    console.log(`Generating ${TOTAL} documents …`);
    const samples = await makeSamples();

    const latencies: { kind: Sample["kind"]; ms: number; size: number }[] = [];
    const memory: number[] = [];
    const t0 = performance.now();
    for (const [i, s] of samples.entries()) {
      const form = new FormData();
      form.append("file", new Blob([new Uint8Array(s.bytes)]), s.name);
      const started = performance.now();
      const res = await fetch(`${url}/api/documents`, { method: "POST", headers: { cookie, origin: url }, body: form });
      await res.arrayBuffer();
      if (res.status !== 201) throw new Error(`upload ${s.name} answered ${res.status}`);
      latencies.push({ kind: s.kind, ms: performance.now() - started, size: s.bytes.length });
      if (i % 20 === 19) memory.push(rssMb(server.child.pid!));
    }
    const uploadSeconds = (performance.now() - t0) / 1000;
    const mb = latencies.filter((l) => l.kind === "mb-pdf");

    console.log("Reading everything with one worker (concurrency 1) …");
    const { startWorkers } = await import("@/lib/jobs/worker");
    const { readJob } = await import("@/lib/jobs/read-job");
    const { getDb } = await import("@/db");
    const { shutdownOcr } = await import("@/lib/intake");
    const readStart = performance.now();
    const workers = startWorkers({ handlers: { read: readJob }, concurrency: 1, pollMs: 100, leaseSeconds: 300, log: () => {} });
    for (;;) {
      const [{ n }] = await getDb()("documents").where({ status: "reading" }).count({ n: "*" });
      if (Number(n) === 0) break;
      await new Promise((r) => setTimeout(r, 500));
    }
    await workers.stop();
    const readSeconds = (performance.now() - readStart) / 1000;
    const rows: { media_type: string; status: string; read_ms: number; page_count: number; ocr_pages: number }[] = await getDb()("documents").select(
      "media_type",
      "status",
      "read_ms",
      "page_count",
      "ocr_pages",
    );
    const textPdf = rows.filter((r) => r.media_type === "application/pdf" && r.ocr_pages === 0 && r.status === "ready");
    const ocr = rows.filter((r) => r.ocr_pages > 0);
    const perTextPage = textPdf.reduce((a, r) => a + r.read_ms, 0) / textPdf.reduce((a, r) => a + r.page_count, 0);
    const perOcrPage = ocr.reduce((a, r) => a + r.read_ms, 0) / ocr.reduce((a, r) => a + r.ocr_pages, 0);
    await shutdownOcr();

    const report = {
      documents: TOTAL,
      upload: {
        uploadsPerSecond: +(TOTAL / uploadSeconds).toFixed(1),
        p50Ms: +percentile(latencies.map((l) => l.ms), 50).toFixed(1),
        p95Ms: +percentile(latencies.map((l) => l.ms), 95).toFixed(1),
        oneMegabyte: { files: mb.length, meanSizeKb: Math.round(mb.reduce((a, l) => a + l.size, 0) / mb.length / 1024), p50Ms: +percentile(mb.map((l) => l.ms), 50).toFixed(1), p95Ms: +percentile(mb.map((l) => l.ms), 95).toFixed(1) },
      },
      reading: {
        seconds: +readSeconds.toFixed(1),
        ready: rows.filter((r) => r.status === "ready").length,
        unreadable: rows.filter((r) => r.status === "unreadable").length,
        textPdfMsPerPage: +perTextPage.toFixed(1),
        ocrMsPerPage: Math.round(perOcrPage),
        ocrPages: ocr.reduce((a, r) => a + r.ocr_pages, 0),
      },
      serverRssMbEvery20Uploads: memory.map((m) => Math.round(m)),
      goals: "upload p95 < 300 ms for a 1 MB file; text PDF < 50 ms/page; OCR < 4 s/page on one core; memory flat",
      machine: { cores: (await import("node:os")).cpus().length, loadavg: loadAverage() },
    };
    console.log(JSON.stringify(report, null, 2));
  } finally {
    await server.stop();
    await stack.close();
  }
}

runBench(main);
