// Plain JavaScript entry for the training workers, so Node.js can start it from tsx, vitest or
// plain node alike; it loads the TypeScript worker through tsx's programmatic API.
import { tsImport } from "tsx/esm/api";

await tsImport("./ovr-worker.ts", import.meta.url);
