// Plain JavaScript entry for the training workers, so Node.js can start it from tsx, vitest or
// plain node alike. It loads the TypeScript worker through tsx's CommonJS API: that compiles in
// this thread, where the ESM API (tsImport) starts a loader thread per worker and took about
// twice as long to be ready.
import { require as requireTs } from "tsx/cjs/api";

requireTs("./ovr-worker.ts", import.meta.url);
