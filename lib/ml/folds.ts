// Stratified k-fold splits with a fixed seed: each class's rows are shuffled (mulberry32
// generator, a small public-domain PRNG) and dealt round-robin over the folds, so every fold
// holds about 1/k of each class, and the same seed always gives the same folds.

/** A seeded uniform generator in [0, 1). */
export function createRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Fisher–Yates shuffle in place. */
function shuffle(a: number[], random: () => number): void {
  for (let i = a.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [a[i], a[j]] = [a[j], a[i]];
  }
}

/** Returns the fold number (0..k−1) of every row. */
export function assignStratifiedFolds(labels: string[], k: number, seed = 42): Int32Array {
  if (!(Number.isInteger(k) && k >= 2)) throw new Error(`Folds must be a whole number ≥ 2, got ${k}.`);
  if (labels.length < k) throw new Error(`${k} folds need at least ${k} documents; there are ${labels.length}.`);
  const byClass = new Map<string, number[]>();
  labels.forEach((l, i) => {
    const rows = byClass.get(l) ?? [];
    rows.push(i);
    byClass.set(l, rows);
  });
  const random = createRandom(seed);
  const fold = new Int32Array(labels.length);
  // Continue the round-robin across classes so small classes do not all start in fold 0.
  let cursor = 0;
  for (const label of [...byClass.keys()].sort()) {
    const rows = byClass.get(label)!;
    shuffle(rows, random);
    for (const i of rows) fold[i] = cursor++ % k;
  }
  return fold;
}
