import { z } from "zod";
import { RETENTION_YEARS_MAX } from "@/lib/records/retention-date";

// Input of the records routes: legal holds, disposal, retention impact.
const id = z.coerce.number().int().positive();
const reason = (what: string) =>
  z.string({ message: `Give a reason ${what}.` }).trim().min(3, `Give a reason ${what} (at least 3 characters).`).max(600, "Keep the reason under 600 characters.");

/** Exactly batch sizes an admin can review by eye on one screen; larger runs go in several batches. */
export const DISPOSAL_BATCH_MAX = 500;

export const placeHoldSchema = z
  .object({
    matterId: id.optional(),
    documentId: id.optional(),
    reason: reason("for the hold"),
    reference: z.string({ message: "Give a reference: the case or request number the hold is for." }).trim().min(1, "Give a reference: the case or request number the hold is for.").max(120, "Keep the reference under 120 characters."),
  })
  .refine((v) => (v.matterId === undefined) !== (v.documentId === undefined), { message: "Name either a matterId or a documentId to hold, not both and not neither." });

export const releaseHoldSchema = z.object({ reason: reason("for lifting the hold") });

export const holdListSchema = z.object({
  status: z.enum(["active", "released", "all"], { message: "status is active, released or all." }).default("active"),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});

export const dueListSchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(DISPOSAL_BATCH_MAX).default(100),
});

export const proposeBatchSchema = z.object({
  documentIds: z
    .array(z.number().int().positive(), { message: "documentIds is a list of document numbers." })
    .min(1, "Pick at least one document to propose for disposal.")
    .max(DISPOSAL_BATCH_MAX, `Propose at most ${DISPOSAL_BATCH_MAX} documents in one batch; split the rest into another.`),
  note: z.string({ message: "Add a note saying why this batch may go." }).trim().min(3, "Add a note saying why this batch may go (at least 3 characters).").max(1000, "Keep the note under 1,000 characters."),
});

export const rejectBatchSchema = z.object({ reason: reason("for rejecting the batch") });

export const certificateSchema = z.object({
  format: z.enum(["pdf", "csv"], { message: "format is pdf or csv." }).default("pdf"),
});

const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "closedOn must be a date like 2026-12-01, or empty for a matter that is open again.");

export const typeImpactSchema = z
  .object({
    cabinetTypeId: id,
    trigger: z.enum(["after_filing", "after_matter_close", "permanent"], { message: "trigger is after_filing, after_matter_close or permanent." }),
    years: z.coerce.number().int("years is a whole number.").min(0, "years is 0 or more.").max(RETENTION_YEARS_MAX, `years is at most ${RETENTION_YEARS_MAX}.`).optional(),
  })
  .refine((v) => v.trigger === "permanent" || v.years !== undefined, { message: "Give years for a rule that runs after filing or after the matter closes.", path: ["years"] });

/** closedOn empty: the matter would be open (again), with no closing date. */
export const matterImpactSchema = z.object({ matterId: id, closedOn: z.union([day, z.literal("")]) });

export const batchIdSchema = z.coerce.number().int().positive("A batch id is a positive whole number.");
