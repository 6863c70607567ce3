import os from "node:os";
import { createWorker, type Worker } from "tesseract.js";
import type { Worker as ThreadWorker } from "node:worker_threads";
import type { Deadline } from "./deadline";
import { resolveOcrLanguagePath } from "./ocr-language";

// A small pool of tesseract workers per process, each reading one page at a time. OCR is
// CPU-bound, so the pool has one worker per core (at most OCR_MAX_WORKERS): the pages of one long
// scan are spread over them, and a second worker on a single core would only split the time.
// The reading jobs bound how many files are read at once; this module bounds the OCR underneath.
const RECYCLE_AFTER_PAGES = 100; // tesseract.js workers grow in memory over long runs
const IDLE_SHUTDOWN_MS = 60_000; // frees ~100 MB a worker when no scans arrive, and lets scripts exit
const OCR_MAX_WORKERS = 2; // ~100 MB each; two cores is the machine this is sized for

interface Engine {
  worker: Worker;
  crashed: Promise<never>;
  pages: number;
}

interface Slot {
  engine: Promise<Engine> | null;
  queue: Promise<unknown>;
  waiting: number;
  idleTimer?: NodeJS.Timeout;
}

let slots: Slot[] = [];

/** How many pages can be OCR'd at once in this process. */
export function ocrWorkerCount(): number {
  return Math.max(1, Math.min(OCR_MAX_WORKERS, os.availableParallelism()));
}

function pickSlot(): Slot {
  if (slots.length === 0) slots = Array.from({ length: ocrWorkerCount() }, () => ({ engine: null, queue: Promise.resolve(), waiting: 0 }));
  return slots.reduce((best, s) => (s.waiting < best.waiting ? s : best));
}

/** OCRs one PNG/JPEG/TIFF image within the deadline; the time spent waiting for a worker counts. */
export function recognizeImage(image: Uint8Array, deadline: Deadline): Promise<string> {
  const slot = pickSlot();
  const state = { running: false };
  slot.waiting += 1;
  const job = slot.queue.then(() => runRecognition(slot, image, deadline, state)).finally(() => (slot.waiting -= 1));
  slot.queue = job.catch(() => undefined);
  // Stop the worker only if this page is on it: a page still waiting its turn must not kill
  // another page's OCR; it gives up by itself when its turn comes (`deadline.check()`).
  return deadline.race(job, () => {
    if (state.running) void discardEngine(slot);
  });
}

/** Stops the OCR workers; call on server shutdown and at the end of scripts and test files. */
export async function shutdownOcr(): Promise<void> {
  const all = slots;
  slots = [];
  await Promise.all(all.map((s) => (clearTimeout(s.idleTimer), discardEngine(s))));
}

async function runRecognition(slot: Slot, image: Uint8Array, deadline: Deadline, state: { running: boolean }): Promise<string> {
  deadline.check(); // the budget may have run out while this page waited its turn
  clearTimeout(slot.idleTimer);
  state.running = true;
  const current = await obtainEngine(slot);
  try {
    // Copy: tesseract.js transfers the buffer to its thread, and the caller may still need it.
    const result = await Promise.race([current.worker.recognize(Buffer.from(image)), current.crashed]);
    return result.data.text;
  } finally {
    state.running = false;
    current.pages += 1;
    if (current.pages >= RECYCLE_AFTER_PAGES) await discardEngine(slot, current);
    slot.idleTimer = setTimeout(() => void discardEngine(slot), IDLE_SHUTDOWN_MS).unref();
  }
}

function obtainEngine(slot: Slot): Promise<Engine> {
  slot.engine ??= startEngine().catch((error: unknown) => {
    slot.engine = null;
    throw error;
  });
  return slot.engine;
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

/** Stops the slot's engine, or only `expected` if that is still the slot's one. */
async function discardEngine(slot: Slot, expected?: Engine): Promise<void> {
  const pending = slot.engine;
  if (!pending) return;
  const current = await pending.catch(() => null);
  if (expected && current !== expected) return;
  if (slot.engine === pending) slot.engine = null;
  try {
    await current?.worker.terminate();
  } catch {
    // A worker that already crashed has nothing left to stop.
  }
}
