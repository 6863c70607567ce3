import { describe, expect, it } from "vitest";
import { buildCsrFromDense } from "@/lib/ml/csr";
import { trainOneVsRest } from "@/lib/ml/one-vs-rest";
import { createRandom } from "@/lib/ml/folds";

// The worker threads must load under vitest (here), under tsx (cli.test.ts) and give exactly
// what training in one thread gives.
describe("one-vs-rest on worker threads", () => {
  it("trains one binary model per class on two workers, identical to one thread", async () => {
    const random = createRandom(5);
    const rows = Array.from({ length: 200 }, () => Array.from({ length: 12 }, () => (random() < 0.4 ? random() : 0)));
    const labels = Int32Array.from(rows, (r) => (r[0] + r[1] > r[2] + r[3] ? 0 : r[4] > 0.3 ? 1 : r[5] > 0.2 ? 2 : 3));
    const x = buildCsrFromDense(rows);
    const options = { C: 5, tolerance: 1e-8, maxIterations: 200, balanced: true };
    const single = await trainOneVsRest(x, labels, 4, { ...options, threads: 1 });
    const parallel = await trainOneVsRest(x, labels, 4, { ...options, threads: 2 });
    expect(single.threadsUsed).toBe(1);
    expect(parallel.threadsUsed).toBe(2);
    expect(parallel.iterations.length).toBe(4);
    expect(Array.from(parallel.weights)).toEqual(Array.from(single.weights));
    expect(Array.from(parallel.intercepts)).toEqual(Array.from(single.intercepts));
  });

  it("reuses the started workers for the next training, and for two at once", async () => {
    const random = createRandom(9);
    const rows = Array.from({ length: 120 }, () => Array.from({ length: 8 }, () => (random() < 0.5 ? random() : 0)));
    const labels = Int32Array.from(rows, (r) => (r[0] > r[1] ? 0 : r[2] > 0.3 ? 1 : 2));
    const x = buildCsrFromDense(rows);
    const options = { C: 2, tolerance: 1e-8, maxIterations: 200, balanced: false };
    const single = await trainOneVsRest(x, labels, 3, { ...options, threads: 1 });
    const [a, b] = await Promise.all([1, 2].map(() => trainOneVsRest(x, labels, 3, { ...options, threads: 2 })));
    for (const m of [a, b]) {
      expect(m.threadsUsed).toBe(2);
      expect(Array.from(m.weights)).toEqual(Array.from(single.weights));
    }
  });
});
