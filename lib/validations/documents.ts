import { z } from "zod";

export const documentListSchema = z.object({
  status: z.enum(["reading", "ready", "unreadable"]).optional(),
  q: z.string().trim().max(200).optional(),
  mine: z.enum(["1", "true"]).optional(),
  ids: z
    .string()
    .regex(/^\d+(,\d+)*$/, "ids must be document numbers separated by commas.")
    .max(2000)
    .optional(),
  cabinetType: z.coerce.number().int().positive().optional(),
  matter: z.coerce.number().int().positive().optional(),
  filed: z.enum(["0", "1", "true", "false"]).optional(),
  retention: z.enum(["past_due", "due_soon"], { message: "retention is past_due (the retention date is today or earlier) or due_soon (within 90 days)." }).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});

export const documentIdSchema = z.coerce.number().int().positive("A document id is a positive whole number.");
