import type { SuggestionDetail } from "@/lib/data/filing-record";
import { ConfidenceBar } from "@/components/ui/confidence-bar";
import type { DocumentState } from "./document-state";
import { formatUtc } from "./format";

function methodWords(s: SuggestionDetail): string {
  const version = s.modelVersionId !== null ? `model version #${s.modelVersionId}` : "the model";
  if (s.method === "cold_start") return "Ranked by descriptions: no model yet";
  if (s.method === "blended") return `From ${version}; cabinet types with too few filed examples ranked by their descriptions`;
  return `From ${version}`;
}

/** A token as a person reads it: filename and metadata tokens carry prefixes in the model. */
function termWords(term: string): { text: string; where: string | null } {
  if (term.startsWith("file:")) return { text: term.slice(5), where: "file name" };
  if (term.startsWith("meta:")) return { text: term.slice(5).replace("=", ": "), where: "file facts" };
  return { text: term, where: null };
}

const SHOWN_RANKS = 5;

/** The latest suggestion: ranked cabinet types, why, matter candidates and how it was made. */
export function SuggestionPanel({ suggestion: s, state }: { suggestion: SuggestionDetail | null; state: DocumentState }) {
  if (!s) {
    const why =
      state === "filed"
        ? "None was made: a person filed this document before Foldwright suggested a place for it."
        : state === "reading"
          ? "Foldwright suggests a place once the text is read."
          : state === "unreadable"
            ? "No text could be read, so there is nothing to suggest from. File it by hand."
            : "Foldwright has not suggested a place yet; it does so shortly after the text is read.";
    return (
      <section aria-labelledby="suggestion-heading" className="rounded border border-paper-edge bg-white/70 p-4">
        <h2 id="suggestion-heading" className="font-serif text-lg">Suggestion</h2>
        <p className="mt-1 text-sm text-ink-soft">{why}</p>
      </section>
    );
  }
  const top = s.ranked.slice(0, SHOWN_RANKS);
  const why = s.why.slice(0, 10);
  return (
    <section aria-labelledby="suggestion-heading" className="space-y-4 rounded border border-paper-edge bg-white/70 p-4" data-testid="suggestion">
      <div>
        <h2 id="suggestion-heading" className="font-serif text-lg">Suggestion</h2>
        <p className="text-xs text-ink-soft" data-testid="suggestion-method">
          {methodWords(s)} · <span className="font-mono">{formatUtc(s.createdAt)}</span> UTC
        </p>
      </div>
      {s.noConfidentMatch && (
        <p className="rounded bg-amber-light/70 px-2 py-1 text-xs text-ink">No confident match: no cabinet type stands out. A person should choose where it goes.</p>
      )}

      <div>
        <h3 className="mb-1 text-xs font-medium text-ink-soft">Cabinet types, best first</h3>
        <ol className="space-y-1" data-testid="suggestion-ranked">
          {top.map((r, i) => (
            <li key={r.cabinetTypeId} className="flex items-center gap-2 text-sm">
              <span className="w-4 text-right font-mono text-xs text-ink-faint">{i + 1}</span>
              <span className={`min-w-0 flex-1 ${i === 0 ? "font-medium" : ""}`}>
                {r.name}
                {s.method === "blended" && r.source === "description" && <span className="ml-1 text-xs font-normal text-ink-faint">(by description)</span>}
              </span>
              <ConfidenceBar value={r.confidence} barClassName="w-20" />
            </li>
          ))}
        </ol>
        {s.ranked.length > SHOWN_RANKS && <p className="mt-1 text-xs text-ink-faint">and {s.ranked.length - SHOWN_RANKS} more cabinet types below {Math.round(top[top.length - 1].confidence * 100)}%.</p>}
      </div>

      {why.length > 0 && (
        <div>
          <h3 className="mb-1 text-xs font-medium text-ink-soft">
            Why {top[0] ? <span className="text-ink">{top[0].name}</span> : "this"}: the words that weighed most
          </h3>
          <ul className="flex flex-wrap gap-1" data-testid="suggestion-why">
            {why.map((w) => {
              const t = termWords(w.term);
              return (
                <li key={w.term} className="rounded bg-paper-deep px-1.5 py-0.5 text-xs" title={w.weight ? `weight ${w.weight.toFixed(3)}` : "keyword of the cabinet type"}>
                  {t.where && <span className="text-ink-faint">{t.where}: </span>}
                  <span className="font-mono">{t.text}</span>
                  {w.weight > 0 && <span className="ml-1 font-mono text-ink-faint">{w.weight.toFixed(2)}</span>}
                </li>
              );
            })}
          </ul>
        </div>
      )}

      <div>
        <h3 className="mb-1 text-xs font-medium text-ink-soft">Matter</h3>
        {s.matterCandidates.length === 0 ? (
          <p className="text-sm text-ink-soft">No matter found in the text: pick one when filing.</p>
        ) : (
          <ul className="space-y-2" data-testid="suggestion-matters">
            {s.matterCandidates.map((m) => (
              <li key={m.matterId} className="text-sm">
                <div className="flex items-center gap-2">
                  <span className="font-mono text-xs">{m.number}</span>
                  <span className="min-w-0 flex-1 truncate" title={m.title}>{m.title}</span>
                  <ConfidenceBar value={m.score} barClassName="w-12" />
                </div>
                {m.reasons.length > 0 && <p className="text-xs text-ink-soft">{m.reasons.join("; ")}</p>}
                {m.matterId === s.matterId && !s.matterAmbiguous && <p className="text-xs text-verdigris-dark">Suggested matter</p>}
              </li>
            ))}
          </ul>
        )}
        {s.matterAmbiguous && s.matterCandidates.length > 0 && <p className="mt-1 text-xs text-amber">More than one matter fits: a person picks.</p>}
      </div>

      <p className="border-t border-paper-edge pt-2 text-xs text-ink-faint">
        Suggestions are machine output: a person remains responsible for filing privileged or sensitive documents.
      </p>
    </section>
  );
}
