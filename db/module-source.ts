// Loads migration and seed files with a dynamic import() instead of Knex's own require(), so the
// same TypeScript files run under tsx (the npm scripts) and under Vitest's module runner.
import fs from "node:fs";
import path from "node:path";
import type { Knex } from "knex";

function listFiles(directory: string): string[] {
  return fs
    .readdirSync(directory)
    .filter((f) => /\.ts$/.test(f) && !f.endsWith(".d.ts"))
    .sort();
}

async function load<T>(directory: string, file: string): Promise<T> {
  return (await import(/* @vite-ignore */ path.join(directory, file))) as T;
}

export function migrationSource(directory: string): Knex.MigrationSource<string> {
  return {
    getMigrations: async () => listFiles(directory),
    getMigrationName: (file) => file,
    getMigration: (file) => load<Knex.Migration>(directory, file),
  };
}

/** Runs every seed file in name order; each must be safe to run twice. */
export async function runSeeds(knex: Knex, directory: string): Promise<string[]> {
  const files = listFiles(directory);
  for (const file of files) {
    const mod = await load<{ seed: (k: Knex) => Promise<void> }>(directory, file);
    await mod.seed(knex);
  }
  return files;
}
