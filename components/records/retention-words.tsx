import type { DocumentRetention } from "@/lib/data/documents";
import { NO_DATE_WORDS, retentionStanding, utcDay } from "@/lib/records/retention-date";

const STANDING_WORDS = { past_due: "past due", due_soon: "due within 90 days", later: "", none: "" } as const;

/** The retention date with its standing in words ("past due", "due within 90 days"), or why there is none. */
export function RetentionWords({ retention, held, disposedAt, long = false }: { retention: DocumentRetention; held: boolean; disposedAt: string | null; long?: boolean }) {
  if (disposedAt) return <span className="text-xs text-ink-soft">destroyed {utcDay(disposedAt)}</span>;
  if (!retention.dueOn) {
    const why = retention.basis in NO_DATE_WORDS ? NO_DATE_WORDS[retention.basis as keyof typeof NO_DATE_WORDS] : "";
    return <span className="text-xs text-ink-soft">{long ? why : retention.basis === "permanent" ? "permanent" : retention.basis === "matter_open" ? "when the matter closes" : "–"}</span>;
  }
  const standing = retentionStanding(retention.dueOn, utcDay(new Date()));
  return (
    <span className="text-xs">
      <span className="font-mono">{retention.dueOn}</span>
      {STANDING_WORDS[standing] && <span className={standing === "past_due" ? " font-medium text-amber" : " text-ink-soft"}> · {STANDING_WORDS[standing]}</span>}
      {standing === "past_due" && held && <span className="text-brick"> · kept by a legal hold</span>}
      {long && retention.rule && <span className="text-ink-soft"> ({retention.rule})</span>}
    </span>
  );
}
