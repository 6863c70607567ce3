// The Setup schemas, shared by the route handlers and the forms (which validate as you type with
// these same objects, so a form never accepts what the route would refuse). Messages are
// sentences that say what to do.
import { z } from "zod";

/** The longest retention an admin can type: a century covers every schedule we know of (common practice). */
export const MAX_RETENTION_YEARS = 100;
export const RETENTION_TRIGGERS = ["after_filing", "after_matter_close", "permanent"] as const;
export type RetentionTrigger = (typeof RETENTION_TRIGGERS)[number];

const name = (what: string, max: number) =>
  z
    .string({ message: `Give the ${what} a name.` })
    .trim()
    .min(1, `Give the ${what} a name.`)
    .max(max, `Keep the ${what}'s name to ${max} characters or fewer.`);

const keyword = z.string().trim().min(1, "Remove the empty keyword.").max(60, "Keep each keyword to 60 characters or fewer.");

const cabinetTypeFields = {
  name: name("cabinet type", 120),
  description: z
    .string({ message: "Describe the cabinet type: what documents belong in it." })
    .trim()
    .min(1, "Describe the cabinet type: what documents belong in it. Foldwright ranks a new type by this until it has filed examples.")
    .max(2000, "Keep the description to 2,000 characters or fewer."),
  keywords: z.array(keyword).max(40, "Use at most 40 keywords; the most telling ones are enough."),
  retentionYears: z
    .number({ message: "Retention years must be a whole number, or empty for permanent." })
    .int("Retention years must be a whole number.")
    .min(1, "Keep documents at least 1 year, or choose permanent.")
    .max(MAX_RETENTION_YEARS, `Retention years must be at most ${MAX_RETENTION_YEARS}; choose permanent to keep documents for good.`)
    .nullable(),
  retentionTrigger: z.enum(RETENTION_TRIGGERS, { message: "Choose when retention starts: after filing, after the matter closes, or permanent." }),
  retentionSource: z
    .string({ message: "Say where the retention period comes from (a rule, your professional body, or common practice)." })
    .trim()
    .min(1, "Say where the retention period comes from (a rule, your professional body, or common practice).")
    .max(400, "Keep the retention source to 400 characters or fewer."),
};

type Retention = { retentionYears?: number | null; retentionTrigger?: RetentionTrigger };

/** Permanent has no years; every other trigger needs them. */
function checkRetention(v: Retention, ctx: z.RefinementCtx) {
  if (v.retentionTrigger === undefined && v.retentionYears === undefined) return;
  if (v.retentionTrigger === "permanent" && v.retentionYears != null) {
    ctx.addIssue({ code: "custom", path: ["retentionYears"], message: "A permanent type keeps documents for good: leave the years empty, or choose another trigger." });
  }
  if (v.retentionTrigger && v.retentionTrigger !== "permanent" && v.retentionYears == null) {
    ctx.addIssue({ code: "custom", path: ["retentionYears"], message: "Say how many years to keep documents, or choose permanent." });
  }
}

export const cabinetTypeSchema = z.object(cabinetTypeFields).superRefine(checkRetention);
export type CabinetTypeInput = z.infer<typeof cabinetTypeSchema>;

/** Any field; `active: false` retires the type, `active: true` brings it back. */
// The retention pair is checked again on the merged row by the Data Access Layer (a patch may
// send only one half of it).
export const cabinetTypePatchSchema = z
  .object({ ...cabinetTypeFields, active: z.boolean({ message: "active must be true or false." }) })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type CabinetTypePatch = z.infer<typeof cabinetTypePatchSchema>;

export const mergeSchema = z.object({
  intoId: z.number({ message: "Choose the cabinet type to merge into." }).int().positive("Choose the cabinet type to merge into."),
});

const DOMAIN = /^(?=.{1,253}$)([a-z0-9]([a-z0-9-]{0,61}[a-z0-9])?\.)+[a-z]{2,63}$/;

const clientFields = {
  name: name("client", 200),
  aliases: z.array(z.string().trim().min(1, "Remove the empty alias.").max(200, "Keep each alias to 200 characters or fewer.")).max(20, "Use at most 20 aliases."),
  emailDomains: z
    .array(
      z
        .string()
        .trim()
        .toLowerCase()
        .transform((d) => d.replace(/^@/, ""))
        .pipe(z.string().regex(DOMAIN, "Write each e-mail domain like alderquay.example, without a name before the @.")),
    )
    .max(20, "Use at most 20 e-mail domains."),
  // Only ever the last four digits: a whole tax ID must never reach the database (DESIGN §5).
  taxIdLast4: z
    .string()
    .trim()
    .regex(/^\d{4}$/, "Type only the last four digits of the tax ID (never the whole number), or leave it empty.")
    .nullable(),
};

export const clientSchema = z.object({ ...clientFields, aliases: clientFields.aliases.default([]), emailDomains: clientFields.emailDomains.default([]), taxIdLast4: clientFields.taxIdLast4.optional().default(null) });
export type ClientInput = z.infer<typeof clientSchema>;
export const clientPatchSchema = z
  .object(clientFields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type ClientPatch = z.infer<typeof clientPatchSchema>;

const DATE = /^\d{4}-\d{2}-\d{2}$/;
/** A YYYY-MM-DD that exists on the calendar (2026-02-30 has the shape and is no day). */
export const isCalendarDate = (s: string) => DATE.test(s) && new Date(`${s}T00:00:00Z`).toISOString().slice(0, 10) === s;
const date = (what: string) => z.string({ message: `Give the ${what} date.` }).refine(isCalendarDate, `Write the ${what} date as a day like 2026-12-01.`);

export const MATTER_STATUSES = ["open", "closed"] as const;

const matterFields = {
  clientId: z.number({ message: "Choose the client." }).int().positive("Choose the client."),
  number: z
    .string({ message: "Give the matter a number." })
    .trim()
    .min(1, "Give the matter a number.")
    .max(40, "Keep the matter number to 40 characters or fewer."),
  title: z.string({ message: "Give the matter a title." }).trim().min(1, "Give the matter a title.").max(200, "Keep the title to 200 characters or fewer."),
  restricted: z.boolean({ message: "restricted must be true or false." }),
  team: z.array(z.number().int().positive()).max(200, "A team has at most 200 people."),
  openedOn: date("opened"),
  closedOn: date("closed").nullable(),
  status: z.enum(MATTER_STATUSES, { message: "Status must be open or closed." }),
};

type Dates = { openedOn?: string; closedOn?: string | null; status?: "open" | "closed" };

/** Closing needs its date (retention after close runs from it); an open matter has none. */
function checkDates(v: Dates, ctx: z.RefinementCtx) {
  if (v.status === "closed" && !v.closedOn) ctx.addIssue({ code: "custom", path: ["closedOn"], message: "Give the date the matter closed: retention after close runs from it." });
  if (v.status === "open" && v.closedOn) ctx.addIssue({ code: "custom", path: ["closedOn"], message: "An open matter has no closed date: clear it, or set the status to closed." });
  if (v.openedOn && v.closedOn && v.closedOn < v.openedOn) ctx.addIssue({ code: "custom", path: ["closedOn"], message: "The closed date is before the opened date. Check both." });
}

export const matterSchema = z
  .object({ ...matterFields, restricted: matterFields.restricted.default(false), team: matterFields.team.default([]), closedOn: matterFields.closedOn.optional().default(null), status: matterFields.status.default("open") })
  .superRefine(checkDates);
export type MatterInput = z.infer<typeof matterSchema>;
// Dates and status are checked again on the merged row by the Data Access Layer.
export const matterPatchSchema = z
  .object(matterFields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type MatterPatch = z.infer<typeof matterPatchSchema>;

export const SETUP_EVENT_ENTITIES = ["cabinet_type", "client", "matter", "team", "user", "sender", "settings"] as const;

export const setupEventsQuerySchema = z.object({
  entity: z.enum(SETUP_EVENT_ENTITIES, { message: "entity must be one of cabinet_type, client, matter, team, user, sender or settings." }).optional(),
  entityId: z.coerce.number().int().positive().optional(),
  format: z.enum(["json", "csv"]).default("json"),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(10_000).default(100),
});

/** `page` and `pageSize` of the clients and matters lists (DESIGN §10). */
export const pageSchema = z.object({
  page: z.coerce.number().int().min(1, "page must be 1 or more.").default(1),
  pageSize: z.coerce.number().int().min(1).max(1000, "pageSize must be at most 1000.").default(500),
});

/** `?all=1` on the lists: include retired types / every matter. */
export const listFlagSchema = z.object({ all: z.enum(["0", "1"]).optional() });

/** Route ids: a positive whole number, or a 404 sentence. */
export const idSchema = z.coerce.number().int().positive();
