// Client calls that take decisions back (POST …/filing {action: "undo"} and POST /api/review/undo).
import { requestJson } from "@/components/ui/request-json";

/** One decision as the server answered it: enough to undo it. */
export interface DecidedEvent {
  documentId: number;
  eventId: number;
}

interface UndoManyAnswer {
  undone: number;
  results: { eventId: number; ok: boolean; error?: { message: string } }[];
}

/** Undoes the decisions; resolves to the sentences of those the server refused (empty when all went back). */
export async function undoDecisions(events: DecidedEvent[]): Promise<string[]> {
  if (events.length === 1) {
    const [e] = events;
    await requestJson(`/api/documents/${e.documentId}/filing`, { method: "POST", body: JSON.stringify({ action: "undo", eventId: e.eventId }) });
    return [];
  }
  const answer = await requestJson<UndoManyAnswer>("/api/review/undo", { method: "POST", body: JSON.stringify({ eventIds: events.map((e) => e.eventId) }) });
  return answer.results.filter((r) => !r.ok).map((r) => r.error?.message ?? "not undone");
}
