import { z } from "zod";

const folderChoice = z.discriminatedUnion("action", [
  z.object({ name: z.string().min(1), action: z.literal("existing"), cabinetTypeId: z.number().int().positive() }),
  z.object({
    name: z.string().min(1),
    action: z.literal("new"),
    newName: z.string().trim().min(1, "A new cabinet type needs a name.").max(120, "A cabinet type's name has at most 120 characters."),
  }),
  z.object({ name: z.string().min(1), action: z.literal("skip") }),
]);

/** What the admin confirms: where each folder goes, and the matters. */
export const importMappingSchema = z.object({
  folders: z.array(folderChoice).min(1, "Say where at least one folder goes."),
  /** Second-level folders by name; a missing or null matter means the import's matter. */
  matters: z.array(z.object({ name: z.string().min(1), matterId: z.number().int().positive().nullable() })).default([]),
  defaultMatterId: z.number({ message: "Choose the matter for files that are not in a matter's folder." }).int().positive(),
});
export type ImportMapping = z.infer<typeof importMappingSchema>;

export const confirmImportSchema = z.object({ mapping: importMappingSchema });
