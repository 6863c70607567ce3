import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { impactOfClosingDate, impactOfTypeRule } from "@/lib/data/retention";
import { badInput } from "@/lib/errors";
import { RETENTION_CAUTION } from "@/lib/retention";
import { matterImpactSchema, typeImpactSchema } from "@/lib/validations/records";

export const dynamic = "force-dynamic";

/**
 * How many documents a change would touch, before Setup saves it:
 * ?cabinetTypeId=&trigger=&years= (a new rule) or ?matterId=&closedOn= (a new closing date;
 * empty for a matter open again).
 */
export const GET = handle(async (request: Request) => {
  const user = await requireUser("setup.manage", "see the impact of retention changes");
  const params = Object.fromEntries(new URL(request.url).searchParams);
  let impact;
  if (params.cabinetTypeId !== undefined) impact = await impactOfTypeRule(user, typeImpactSchema.parse(params));
  else if (params.matterId !== undefined) {
    const p = matterImpactSchema.parse(params);
    impact = await impactOfClosingDate(user, { matterId: p.matterId, closedOn: p.closedOn || null });
  } else throw badInput("Name a cabinetTypeId with trigger and years (a changed rule), or a matterId with closedOn (a changed closing date).");
  return NextResponse.json({ impact, caution: RETENTION_CAUTION });
});
