/** Share of the expected words (case and punctuation ignored) that appear in the text read back. */
export function measureWordRecall(expectedLines: string[], actual: string): number {
  const expected = toWords(expectedLines.join(" "));
  const found = new Map<string, number>();
  for (const word of toWords(actual)) found.set(word, (found.get(word) ?? 0) + 1);
  let hits = 0;
  for (const word of expected) {
    const left = found.get(word) ?? 0;
    if (left > 0) {
      hits += 1;
      found.set(word, left - 1);
    }
  }
  return hits / expected.length;
}

function toWords(text: string): string[] {
  return text.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [];
}
