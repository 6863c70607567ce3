import { z } from "zod";

export const filingSchema = z.object({
  action: z.enum(["accept", "refile", "file", "confirm", "move", "undo"], { message: "action must be accept, refile, file, confirm, move or undo." }),
  /** For undo: the decision (filing event) to take back. */
  eventId: z.number().int().positive().optional(),
  cabinetTypeId: z.number().int().positive().optional(),
  matterId: z.number().int().positive().optional(),
  reason: z.string().trim().max(600).optional(),
  expectedCabinetTypeId: z.number().int().positive().optional(),
  expectedMatterId: z.number().int().positive().optional(),
});

export const acceptManySchema = z.object({
  documentIds: z.array(z.number().int().positive()).min(1, "Pick at least one document.").max(200, "Accept at most 200 documents at once."),
  /** One matter for all of them; without it each keeps its own suggested matter. */
  matterId: z.number().int().positive().optional(),
});

export const undoManySchema = z.object({
  eventIds: z.array(z.number().int().positive()).min(1, "Name at least one decision to undo.").max(200, "Undo at most 200 decisions at once."),
});

export const queueSchema = z.object({
  list: z.enum(["review", "spot-check"]).default("review"),
  sort: z.enum(["age", "confidence", "cabinet", "matter"]).default("age"),
  dir: z.enum(["asc", "desc"]).default("asc"),
  cabinetType: z.coerce.number().int().positive().optional(),
  matter: z.coerce.number().int().positive().optional(),
  minConfidence: z.coerce.number().min(0).max(1).optional(),
  maxConfidence: z.coerce.number().min(0).max(1).optional(),
  q: z.string().trim().max(200, "Search for at most 200 characters.").optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});

export const eventsSchema = z.object({
  action: z.enum(["suggested", "accepted", "refiled", "filed_by_hand", "auto_filed", "confirmed", "moved", "imported", "undone"]).optional(),
  document: z.coerce.number().int().positive().optional(),
  from: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "from must be a date like 2026-12-01.").optional(),
  to: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "to must be a date like 2026-12-01.").optional(),
  format: z.enum(["json", "csv"]).default("json"),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(10_000).default(100),
});

export const settingsSchema = z.object({
  autoFileEnabled: z.boolean().optional(),
  autoFileTarget: z.number().min(0.5, "The target precision must be at least 0.5.").max(0.9999).optional(),
  minExamplesPerType: z.number().int().min(2).max(1000).optional(),
});
