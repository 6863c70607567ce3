// Filing actions in Foldwright's words (DESIGN §3), for the record on every screen.
export const ACTIONS = ["suggested", "accepted", "refiled", "filed_by_hand", "auto_filed", "confirmed", "moved", "imported", "undone"] as const;
export type FilingAction = (typeof ACTIONS)[number];

export const ACTION_WORDS: Record<FilingAction, string> = {
  suggested: "Suggested",
  accepted: "Accepted",
  refiled: "Refiled",
  filed_by_hand: "Filed by hand",
  auto_filed: "Auto-filed",
  confirmed: "Confirmed",
  moved: "Moved",
  imported: "Imported",
  undone: "Undone",
};

/** Records actions (issue 11), not offered as History filters. */
const RECORD_WORDS: Record<string, string> = { disposed: "Destroyed under an approved disposal" };

export function actionWords(action: string): string {
  return ACTION_WORDS[action as FilingAction] ?? RECORD_WORDS[action] ?? action;
}
