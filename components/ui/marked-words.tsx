import { Fragment } from "react";

/**
 * Stems of the suggestion's "why" terms (or of a search's words) as prefixes to mark. The terms
 * are stems ("compani"), so a word is marked when it starts with one; bigrams mark both words;
 * file:/meta: tokens are not in the text and are skipped.
 */
export function markStems(terms: string[]): string[] {
  return terms
    .filter((t) => !t.includes(":"))
    .flatMap((t) => t.split(/[ _]/))
    .filter((s) => s.length >= 3)
    .map((s) => s.toLowerCase());
}

/** The text with every word that starts with one of the stems in a <mark>. */
export function MarkedWords({ text, stems, markClassName = "rounded bg-verdigris-light px-0.5 text-ink" }: { text: string; stems: string[]; markClassName?: string }) {
  const parts = text.split(/(\p{L}+)/u);
  return (
    <>
      {parts.map((part, i) =>
        i % 2 === 1 && stems.some((s) => part.toLowerCase().startsWith(s)) ? (
          <mark key={i} className={markClassName}>
            {part}
          </mark>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </>
  );
}
