import { formatUtc } from "@/components/document/format";
import type { SetupEvent } from "@/lib/data/setup-events";
import { SetupChange } from "./setup-change";

const TH = "sticky top-0 z-10 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs font-medium text-ink-soft";
const TD = "px-2 py-1 align-top";

export const ENTITY_WORDS: Record<string, string> = { cabinet_type: "Cabinet type", client: "Client", matter: "Matter", team: "Team", user: "Person", sender: "Allowed sender", settings: "Settings" };

/** What the event was about, by the name it had then (the record keeps it in before/after). */
function subject(e: SetupEvent): string {
  const side = (e.after ?? e.before ?? {}) as Record<string, unknown>;
  const then = (e.before ?? e.after ?? {}) as Record<string, unknown>;
  const name = then.name ?? then.number ?? then.matter ?? side.name ?? side.number ?? side.matter;
  return name ? String(name) : e.entityId !== null ? `#${e.entityId}` : "";
}

/** The setup record, newest first. */
export function SetupEventsTable({ items }: { items: SetupEvent[] }) {
  return (
    <div className="max-h-[70vh] overflow-auto rounded border border-paper-edge bg-white/70" tabIndex={0} aria-label="Setup record, scrollable">
      <table className="w-full border-collapse text-sm" data-testid="setup-record-table">
        <thead>
          <tr>
            <th scope="col" className={TH}>When (UTC)</th>
            <th scope="col" className={TH}>What</th>
            <th scope="col" className={TH}>Action</th>
            <th scope="col" className={TH}>Who</th>
            <th scope="col" className={TH}>Before → after</th>
            <th scope="col" className={TH}>Reason</th>
          </tr>
        </thead>
        <tbody>
          {items.map((e) => (
            <tr key={e.id} className="border-t border-paper-edge/70 hover:bg-paper/60" data-testid="setup-record-row" data-action={e.action}>
              <td className={`${TD} whitespace-nowrap font-mono text-xs`}>{formatUtc(e.at, true)}</td>
              <td className={`${TD} min-w-40`}>
                <span className="text-xs text-ink-faint">{ENTITY_WORDS[e.entity] ?? e.entity}</span> {subject(e)}
              </td>
              <td className={`${TD} whitespace-nowrap font-medium`}>{e.action.replace(/_/g, " ")}</td>
              <td className={`${TD} min-w-24`}>{e.user ?? <span className="text-ink-soft">Foldwright</span>}</td>
              <td className={`${TD} min-w-64`}><SetupChange before={e.before} after={e.after} /></td>
              <td className={`${TD} text-xs text-ink-soft`}>{e.reason ?? ""}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
