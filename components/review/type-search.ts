// How the "any cabinet type" picker orders what matches the letters typed. Pure, so the screen
// and the keystroke test share it.
//  1. names that start with the letters, then names with a word that does, then the rest that
//     contain them;
//  2. within each, the document's own ranking (its suggestion's order), most likely first;
//  3. then the names that need more letters to tell apart from the others first, so that every
//     type is a few keys away ("c" lists Corporate minutes and Correspondence before Contracts
//     and Court filings, which "con" and "cou" reach alone); then by name.
export interface TypeChoice {
  id: number;
  name: string;
}

const words = (name: string) => name.toLowerCase().split(/[^\p{L}\p{N}]+/u).filter(Boolean);

/** How many letters of its name it takes until no other name starts the same way. */
export function lettersToTellApart(name: string, all: string[]): number {
  const n = name.toLowerCase();
  const others = all.map((a) => a.toLowerCase()).filter((a) => a !== n);
  for (let k = 1; k <= n.length; k++) if (!others.some((o) => o.startsWith(n.slice(0, k)))) return k;
  return n.length;
}

export function searchTypes<T extends TypeChoice>(types: T[], query: string, ranking: number[] = []): T[] {
  const q = query.trim().toLowerCase();
  const names = types.map((t) => t.name);
  const tier = (t: T) => {
    const n = t.name.toLowerCase();
    if (!q || n.startsWith(q)) return 0;
    if (words(t.name).some((w) => w.startsWith(q))) return 1;
    return n.includes(q) ? 2 : -1;
  };
  const rank = (t: T) => {
    const at = ranking.indexOf(t.id);
    return at === -1 ? ranking.length : at;
  };
  const apart = new Map(types.map((t) => [t.id, lettersToTellApart(t.name, names)]));
  return types
    .map((t) => ({ t, tier: tier(t) }))
    .filter((x) => x.tier >= 0)
    .sort((a, b) => a.tier - b.tier || rank(a.t) - rank(b.t) || apart.get(b.t.id)! - apart.get(a.t.id)! || a.t.name.localeCompare(b.t.name))
    .map((x) => x.t);
}
