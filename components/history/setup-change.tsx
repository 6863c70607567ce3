// One setup event's before → after, field by field, in words a reader can scan.
const LABELS: Record<string, string> = {
  name: "name",
  description: "description",
  keywords: "keywords",
  retentionYears: "retention years",
  retentionTrigger: "retention starts",
  retentionSource: "retention source",
  active: "in use",
  aliases: "aliases",
  emailDomains: "e-mail domains",
  taxIdLast4: "tax ID (last four)",
  number: "number",
  title: "title",
  client: "client",
  restricted: "restricted",
  status: "status",
  openedOn: "opened",
  closedOn: "closed",
  team: "team",
  member: "person",
  matter: "matter",
  mergedInto: "merged into",
  movedDocuments: "documents moved",
};
/** Ids travel with names in the record; the names are what a reader wants. */
const HIDDEN = new Set(["clientId", "memberId", "mergedIntoId"]);

const TRIGGERS: Record<string, string> = { after_filing: "after filing", after_matter_close: "after the matter closes", permanent: "permanent" };

function show(v: unknown, key = ""): string {
  if (key === "retentionTrigger" && typeof v === "string") return TRIGGERS[v] ?? v;
  if (v === null || v === undefined || v === "") return "–";
  if (Array.isArray(v)) return v.length ? v.join(", ") : "none";
  if (typeof v === "boolean") return v ? "yes" : "no";
  return String(v);
}

export function SetupChange({ before, after }: { before: Record<string, unknown> | null; after: Record<string, unknown> | null }) {
  const keys = [...new Set([...Object.keys(before ?? {}), ...Object.keys(after ?? {})])].filter((k) => !HIDDEN.has(k));
  return (
    <dl className="space-y-0.5 text-xs">
      {keys.map((k) => {
        const b = before?.[k];
        const a = after?.[k];
        const same = JSON.stringify(b) === JSON.stringify(a);
        return (
          <div key={k} className="flex gap-1">
            <dt className="shrink-0 text-ink-faint">{LABELS[k] ?? k}:</dt>
            <dd className="min-w-0 break-words">
              {before === null || same || b === undefined ? show(a, k) : after === null || a === undefined ? show(b, k) : (
                <>
                  <span className="text-ink-soft line-through decoration-ink-faint/60">{show(b, k)}</span> → {show(a, k)}
                </>
              )}
            </dd>
          </div>
        );
      })}
    </dl>
  );
}
