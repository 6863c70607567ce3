import "server-only";
import { getDb } from "@/db";
import { can } from "@/lib/auth/permissions";
import { notAllowed } from "@/lib/errors";
import type { CurrentUser } from "@/lib/data/users";

export interface OfficeSettings {
  autoFileEnabled: boolean;
  /** Cross-validated precision the auto-file bar must reach, e.g. 0.98. */
  autoFileTarget: number;
  /** A cabinet type with fewer human-filed examples than this ranks by its description. */
  minExamplesPerType: number;
}

/** The auto-file policy: for the Models screen (admins, auditors) and for Foldwright itself. */
export async function getOfficeSettings(user: CurrentUser): Promise<OfficeSettings> {
  if (!can(user.role, "models.read")) throw notAllowed("see the office settings");
  const r = await getDb()("office_settings").where({ id: 1 }).first();
  return { autoFileEnabled: Boolean(r.auto_file_enabled), autoFileTarget: Number(r.auto_file_target), minExamplesPerType: r.min_examples_per_type };
}

export async function updateOfficeSettings(user: CurrentUser, patch: Partial<OfficeSettings>): Promise<OfficeSettings> {
  const update: Record<string, unknown> = { updated_by: user.id, updated_at: new Date() };
  if (patch.autoFileEnabled !== undefined) update.auto_file_enabled = patch.autoFileEnabled;
  if (patch.autoFileTarget !== undefined) update.auto_file_target = patch.autoFileTarget;
  if (patch.minExamplesPerType !== undefined) update.min_examples_per_type = patch.minExamplesPerType;
  if (!can(user.role, "setup.manage")) throw notAllowed("change the auto-file policy");
  await getDb()("office_settings").where({ id: 1 }).update(update);
  return getOfficeSettings(user);
}
