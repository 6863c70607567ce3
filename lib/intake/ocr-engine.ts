import { createWorker, type Worker } from "tesseract.js";
import type { Worker as ThreadWorker } from "node:worker_threads";
import type { Deadline } from "./deadline";
import { resolveOcrLanguagePath } from "./ocr-language";

// One tesseract worker per process, used by one page at a time: OCR is CPU-bound, so a second
// worker on the same cores would only split the time. The reading jobs bound how many files
// are read at once; this module bounds the OCR underneath them.
const RECYCLE_AFTER_PAGES = 100; // tesseract.js workers grow in memory over long runs
const IDLE_SHUTDOWN_MS = 60_000; // frees ~100 MB when no scans arrive, and lets scripts exit

interface Engine {
  worker: Worker;
  crashed: Promise<never>;
  pages: number;
}

let engine: Promise<Engine> | null = null;
let queue: Promise<unknown> = Promise.resolve();
let idleTimer: NodeJS.Timeout | undefined;

/** OCRs one PNG/JPEG/TIFF image within the deadline; the time spent waiting for the worker counts. */
export function recognizeImage(image: Uint8Array, deadline: Deadline): Promise<string> {
  const state = { running: false };
  const job = queue.then(() => runRecognition(image, deadline, state));
  queue = job.catch(() => undefined);
  // Stop the worker only if this page is on it: a page still waiting its turn must not kill
  // another file's OCR; it gives up by itself when its turn comes (`deadline.check()`).
  return deadline.race(job, () => {
    if (state.running) void discardEngine();
  });
}

/** Stops the OCR worker; call on server shutdown and at the end of scripts and test files. */
export async function shutdownOcr(): Promise<void> {
  clearTimeout(idleTimer);
  await discardEngine();
}

async function runRecognition(image: Uint8Array, deadline: Deadline, state: { running: boolean }): Promise<string> {
  deadline.check(); // the budget may have run out while this page waited its turn
  clearTimeout(idleTimer);
  state.running = true;
  const current = await obtainEngine();
  try {
    // Copy: tesseract.js transfers the buffer to its thread, and the caller may still need it.
    const result = await Promise.race([current.worker.recognize(Buffer.from(image)), current.crashed]);
    return result.data.text;
  } finally {
    state.running = false;
    current.pages += 1;
    if (current.pages >= RECYCLE_AFTER_PAGES) await discardEngine(current);
    idleTimer = setTimeout(() => void discardEngine(), IDLE_SHUTDOWN_MS).unref();
  }
}

function obtainEngine(): Promise<Engine> {
  engine ??= startEngine().catch((error: unknown) => {
    engine = null;
    throw error;
  });
  return engine;
}

async function startEngine(): Promise<Engine> {
  const worker = await createWorker("eng", 1, {
    langPath: resolveOcrLanguagePath(),
    cacheMethod: "none", // otherwise tesseract.js writes the 5 MB data file into the working directory
    gzip: true,
    // Without a handler tesseract.js rethrows a failed job (e.g. an undecodable image) inside its
    // message listener, which is an uncaught exception; the job's own promise still rejects.
    errorHandler: () => undefined,
  });
  const thread = (worker as Worker & { worker: ThreadWorker }).worker;
  const crashed = new Promise<never>((_, reject) => {
    thread.once("error", reject);
    thread.once("exit", (code) => reject(new Error(`The OCR worker stopped (exit code ${code}).`)));
  });
  crashed.catch(() => undefined);
  return { worker, crashed, pages: 0 };
}

/** Stops the current engine, or only `expected` if that is still the current one. */
async function discardEngine(expected?: Engine): Promise<void> {
  const pending = engine;
  if (!pending) return;
  const current = await pending.catch(() => null);
  if (expected && current !== expected) return;
  if (engine === pending) engine = null;
  try {
    await current?.worker.terminate();
  } catch {
    // A worker that already crashed has nothing left to stop.
  }
}
