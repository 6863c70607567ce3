// A filing answer in words, for the confirmation with Undo (components/filing/decision-notice.tsx).
import type { Decision } from "./decision-notice";

interface Named {
  id: number;
  name?: string;
  number?: string;
}

export interface FilingAnswer {
  filing: { eventId: number; action: string; cabinetTypeId: number; matterId: number };
}

const VERBS: Record<string, string> = {
  accepted: "Accepted",
  refiled: "Refiled",
  filed_by_hand: "Filed by hand",
  confirmed: "Confirmed",
  moved: "Moved",
};

/** "Accepted: lease.pdf → Contracts & leases, AQ-2026-0101." with where an undo puts it. */
export function decisionOf(
  name: string,
  documentId: number,
  answer: FilingAnswer,
  ctx: { types: Named[]; matters: Named[]; list?: "review" | "spot-check" },
): Decision {
  const f = answer.filing;
  const type = ctx.types.find((t) => t.id === f.cabinetTypeId)?.name ?? `cabinet type #${f.cabinetTypeId}`;
  const matter = ctx.matters.find((m) => m.id === f.matterId)?.number ?? `matter #${f.matterId}`;
  const verb = VERBS[f.action] ?? "Filed";
  const undoneWords =
    ctx.list === "spot-check" ? "is back in the spot-check list, where it was auto-filed" : f.action === "moved" ? "is back where it was before the move" : "is back in To review";
  return { text: `${verb}: ${name} → ${type}, ${matter}.`, subject: name, events: [{ documentId, eventId: f.eventId }], undoneWords };
}

/** The confirmation of "Accept selected": one Undo for every document that was filed. */
export function manyAcceptedDecision(results: { ok: boolean; documentId: number; filing?: { eventId: number } }[], asked: number): Decision {
  const events = results.filter((r) => r.ok && r.filing).map((r) => ({ documentId: r.documentId, eventId: r.filing!.eventId }));
  const n = events.length;
  return {
    text: `Accepted ${n} of ${asked} selected.`,
    subject: n === 1 ? "1 document" : `${n} documents`,
    events,
    undoneWords: n === 1 ? "is back in To review" : "are back in To review",
  };
}
