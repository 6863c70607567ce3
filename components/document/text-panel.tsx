"use client";
import { useState } from "react";
import { cn } from "@/lib/utils";
import { MarkedWords, markStems } from "@/components/ui/marked-words";

interface TextPanelProps {
  text: string | null;
  truncated: boolean;
  charCount: number | null;
  reading: boolean;
  /** The suggestion's "why" terms, marked in the text. */
  terms?: string[];
}

/** The text Foldwright read, with sensitive numbers masked; mono by default, sans on request. */
export function TextPanel({ text, truncated, charCount, reading, terms = [] }: TextPanelProps) {
  const stems = markStems(terms);
  const [mono, setMono] = useState(true);
  return (
    <section aria-labelledby="text-heading">
      <div className="mb-1 flex items-end gap-3">
        <h2 id="text-heading" className="font-serif text-lg">Text read</h2>
        {charCount !== null && <span className="text-xs text-ink-faint">{charCount.toLocaleString("en-US")} characters</span>}
        {text && (
          <button type="button" onClick={() => setMono((m) => !m)} className="ml-auto text-xs text-verdigris hover:underline" aria-pressed={!mono}>
            {mono ? "Show in plain type" : "Show in fixed-width type"}
          </button>
        )}
      </div>
      {text ? (
        <>
          <pre
            tabIndex={0}
            aria-label="Text read from the document, scrollable"
            data-testid="document-text"
            className={cn("max-h-[32rem] overflow-auto whitespace-pre-wrap break-words rounded border border-paper-edge bg-white/80 p-3 text-xs leading-relaxed", mono ? "font-mono" : "font-sans text-sm")}
          >
            <MarkedWords text={text} stems={stems} />
          </pre>
          <p className="mt-1 text-xs text-ink-faint">
            {stems.length > 0 && "Marked: the words that weighed most in the suggestion. "}
            Social security, bank routing and card numbers are masked here; the original is unchanged.
            {truncated && " Only the beginning of a long text is shown; download the original for the rest."}
          </p>
        </>
      ) : (
        <p className="rounded border border-dashed border-paper-edge px-4 py-3 text-sm text-ink-soft">
          {reading ? "Still reading: the text appears here when it is done. Reload in a moment." : "No text could be read from this file. Download the original to see it."}
        </p>
      )}
    </section>
  );
}
