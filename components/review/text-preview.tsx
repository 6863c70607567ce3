import { Fragment } from "react";

/**
 * The text read, with the words behind the "why" terms marked. The terms are stems ("compani"),
 * so a word is marked when it starts with one; bigrams mark both words; file:/meta: tokens are
 * not in the text and are skipped.
 */
export function TextPreview({ text, terms }: { text: string; terms: string[] }) {
  const stems = terms
    .filter((t) => !t.includes(":"))
    .flatMap((t) => t.split(/[ _]/))
    .filter((s) => s.length >= 3)
    .map((s) => s.toLowerCase());
  const parts = text.split(/(\p{L}+)/u);
  return (
    <div className="max-h-[50vh] overflow-auto whitespace-pre-wrap rounded border border-paper-edge bg-white p-3 text-[13px] leading-relaxed">
      {parts.map((part, i) =>
        i % 2 === 1 && stems.some((s) => part.toLowerCase().startsWith(s)) ? (
          <mark key={i} className="rounded bg-verdigris-light px-0.5 text-ink">
            {part}
          </mark>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </div>
  );
}
