import { NextResponse } from "next/server";
import { handle, errorResponse } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { requestRetrain } from "@/lib/learning/retrain";

export const POST = handle(async () => {
  const user = await requireUser("models.manage", "retrain the models");
  const r = await requestRetrain("manual", user.id);
  if (r.status === "busy") {
    return errorResponse(409, "already_training", `A retraining is already under way (version #${r.versionId}). Watch its progress on the Models page.`);
  }
  return NextResponse.json({ versionId: r.versionId, status: "training" }, { status: 202 });
});
