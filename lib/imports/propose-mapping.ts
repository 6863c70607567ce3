// Proposes where each folder of an archive goes: an existing cabinet type (same name, or a close
// one) or a new type named after the folder; and for second-level folders an existing matter
// (same number, or close). Pure. Closeness is the Levenshtein ratio 1 − d / max(|a|, |b|)
// (fastest-levenshtein) on names folded to lower-case words, or the share of the folder's words
// found in the type's name ("Invoices" in "Invoices & receipts"); 0.75 and the word rule are
// common practice for folder names, chosen on the demo office's types (not from a source).
import { distance } from "fastest-levenshtein";
import type { FolderCount } from "./archive-folders";

export const CLOSE_RATIO = 0.75;

export interface TypeChoice {
  id: number;
  name: string;
}

export interface MatterChoice {
  id: number;
  number: string;
  title: string;
}

export type TypeProposal =
  | { kind: "existing"; cabinetTypeId: number; name: string; match: "exact" | "close"; score: number }
  | { kind: "new"; name: string };

export type MatterProposal = { matterId: number; number: string; match: "exact" | "close" } | null;

export interface FolderProposal extends FolderCount {
  type: TypeProposal;
  matterProposals: { name: string; files: number; matter: MatterProposal }[];
}

/** Lower case, "&" as "and", words of letters and digits only; a trailing plural "s" dropped. */
export function foldName(name: string): string {
  return name
    .toLowerCase()
    .replace(/&/g, " and ")
    .replace(/[_\-.]+/g, " ")
    .replace(/[^\p{L}\p{N} ]+/gu, " ")
    .split(/\s+/)
    .filter(Boolean)
    .map((w) => (w.length > 3 && w.endsWith("s") && !w.endsWith("ss") ? w.slice(0, -1) : w))
    .join(" ");
}

export function nameCloseness(a: string, b: string): number {
  const x = foldName(a);
  const y = foldName(b);
  if (!x || !y) return 0;
  if (x === y) return 1;
  const ratio = 1 - distance(x, y) / Math.max(x.length, y.length);
  const words = x.split(" ");
  const other = new Set(y.split(" ").filter((w) => w !== "and"));
  const shared = words.filter((w) => w !== "and" && other.has(w)).length;
  const meaningful = words.filter((w) => w !== "and").length;
  const wordShare = meaningful > 0 && shared === meaningful ? 0.9 : 0; // every word of the folder is in the name
  return Math.max(ratio, wordShare);
}

export function proposeType(folder: string, types: TypeChoice[]): TypeProposal {
  let best: { type: TypeChoice; score: number } | null = null;
  for (const type of types) {
    const score = nameCloseness(folder, type.name);
    if (!best || score > best.score) best = { type, score };
  }
  if (best && best.score >= CLOSE_RATIO) {
    const exact = best.type.name.trim().toLowerCase() === folder.trim().toLowerCase() || best.score === 1;
    return { kind: "existing", cabinetTypeId: best.type.id, name: best.type.name, match: exact ? "exact" : "close", score: Number(best.score.toFixed(3)) };
  }
  return { kind: "new", name: folder.trim().slice(0, 120) };
}

const foldNumber = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, "");

export function proposeMatter(folder: string, matters: MatterChoice[]): MatterProposal {
  const key = foldNumber(folder);
  if (!key) return null;
  const exact = matters.find((m) => foldNumber(m.number) === key);
  if (exact) return { matterId: exact.id, number: exact.number, match: "exact" };
  // A folder named "AQ-2026-0131 Bakery lease" starts with the number.
  const prefixed = matters.find((m) => foldNumber(folder.split(/\s+/)[0] ?? "") === foldNumber(m.number));
  if (prefixed) return { matterId: prefixed.id, number: prefixed.number, match: "close" };
  const close = matters
    .map((m) => ({ m, d: distance(key, foldNumber(m.number)) }))
    .filter((x) => x.d <= 1 && key.length >= 6)
    .sort((a, b) => a.d - b.d)[0];
  if (close) return { matterId: close.m.id, number: close.m.number, match: "close" };
  const titled = matters.find((m) => nameCloseness(folder, m.title) >= 0.9);
  return titled ? { matterId: titled.id, number: titled.number, match: "close" } : null;
}

export function proposeMapping(folders: FolderCount[], types: TypeChoice[], matters: MatterChoice[]): FolderProposal[] {
  return folders.map((f) => ({
    ...f,
    type: proposeType(f.name, types),
    matterProposals: f.matters.map((m) => ({ ...m, matter: proposeMatter(m.name, matters) })),
  }));
}
