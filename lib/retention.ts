// The caution every retention screen shows (DESIGN §8).
export const RETENTION_CAUTION =
  "Retention periods are defaults. Confirm them against your jurisdiction's rules and your professional body before destroying any record. A legal hold always stops destruction.";
