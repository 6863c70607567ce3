// Small helpers the benchmarks share.
import fs from "node:fs";

/** The p-th percentile (nearest rank) of a list of numbers. */
export function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

export function loadAverage(): string {
  return fs.readFileSync("/proc/loadavg", "utf8").trim();
}
