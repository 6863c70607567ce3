import type { DocumentDetail } from "@/lib/data/documents";
import type { FilingEvent, SuggestionDetail } from "@/lib/data/filing-record";

export type DocumentState = "reading" | "unreadable" | "waiting" | "to_review" | "auto_filed" | "filed";

export const STATE_WORDS: Record<DocumentState, string> = {
  reading: "Reading",
  unreadable: "Unreadable",
  waiting: "Waiting for a suggestion",
  to_review: "To review",
  auto_filed: "Auto-filed, waiting for its spot-check",
  filed: "Filed",
};

/** The latest event that placed the document (anything but a suggestion). */
export function lastPlacement(timeline: FilingEvent[]): FilingEvent | null {
  for (let i = timeline.length - 1; i >= 0; i--) if (timeline[i].action !== "suggested") return timeline[i];
  return null;
}

/** The decision in force: the latest placement that no later "undone" event took back. */
export function placementInForce(timeline: FilingEvent[]): FilingEvent | null {
  const reversed = new Set<number>();
  for (let i = timeline.length - 1; i >= 0; i--) {
    const e = timeline[i];
    if (e.action === "undone") {
      if (e.reversesEventId !== null) reversed.add(e.reversesEventId);
    } else if (e.action !== "suggested" && !reversed.has(e.id)) return e;
  }
  return null;
}

/** Where the document stands, in Foldwright's words, from its row, suggestion and record. */
export function documentState(doc: DocumentDetail, suggestion: SuggestionDetail | null, timeline: FilingEvent[]): DocumentState {
  // An undo can put a document back in To review, so its row (not the record's last line) says whether it is filed.
  if (doc.cabinetType || doc.matter || doc.filedAt) return placementInForce(timeline)?.action === "auto_filed" ? "auto_filed" : "filed";
  if (doc.status === "reading") return "reading";
  if (doc.status === "unreadable") return "unreadable";
  return suggestion ? "to_review" : "waiting";
}
