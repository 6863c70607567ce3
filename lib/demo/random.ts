// A small seeded PRNG for the demo generators: mulberry32 (a well-known 32-bit generator, public
// domain), good enough for varied invented documents and identical output for the same seed.

export interface Random {
  /** Uniform in [0, 1). */
  next(): number;
  /** Whole number in [min, max]. */
  int(min: number, max: number): number;
  pick<T>(items: readonly T[]): T;
  chance(p: number): boolean;
  /** A new array in random order (Fisher–Yates). */
  shuffle<T>(items: readonly T[]): T[];
  /** An amount of money in [min, max] with cents. */
  money(min: number, max: number): number;
}

/** A PRNG whose whole sequence is fixed by `seed`. */
export function createRandom(seed: number): Random {
  let state = seed >>> 0;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const int = (min: number, max: number) => min + Math.floor(next() * (max - min + 1));
  return {
    next,
    int,
    pick: (items) => items[Math.floor(next() * items.length)],
    chance: (p) => next() < p,
    shuffle: (items) => {
      const out = [...items];
      for (let i = out.length - 1; i > 0; i--) {
        const j = Math.floor(next() * (i + 1));
        [out[i], out[j]] = [out[j], out[i]];
      }
      return out;
    },
    money: (min, max) => Math.round((min + next() * (max - min)) * 100) / 100,
  };
}

/** Formats an amount the way US office paper does: 1,296.40. */
export function formatMoney(amount: number): string {
  return amount.toLocaleString("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 });
}

const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** "March 4, 2026", "2026-03-04" or "04/03/2026"-style variants keep dates from being one token. */
export function formatDate(date: Date, style: number): string {
  const [y, m, d] = [date.getUTCFullYear(), date.getUTCMonth(), date.getUTCDate()];
  const pad = (n: number) => String(n).padStart(2, "0");
  if (style % 3 === 0) return `${MONTHS[m]} ${d}, ${y}`;
  if (style % 3 === 1) return `${y}-${pad(m + 1)}-${pad(d)}`;
  return `${pad(m + 1)}/${pad(d)}/${y}`;
}

export function monthName(date: Date): string {
  return MONTHS[date.getUTCMonth()];
}
