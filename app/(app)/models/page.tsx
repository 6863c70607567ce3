import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { ClassMetrics } from "@/components/models/class-metrics";
import { ModelsBoard } from "@/components/models/models-board";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/data/current-user";
import { listModelVersions } from "@/lib/data/models";
import { getCurrentModelReport } from "@/lib/data/screens-models";
import { getOfficeSettings } from "@/lib/data/settings";

export const metadata: Metadata = { title: "Models" };

export default async function ModelsPage() {
  const { user, allowed } = await requirePageUser("models.read");
  if (!allowed) forbidden();
  const [versions, settings, report] = await Promise.all([listModelVersions(user), getOfficeSettings(user), getCurrentModelReport(user)]);
  // The same shape as GET /api/models, so the screen starts filled and then follows the route.
  const initial = {
    versions,
    current: versions.find((v) => v.status === "current")?.id ?? null,
    training: versions.find((v) => v.status === "training") ?? null,
    settings,
  };
  return (
    <section className="max-w-6xl space-y-2">
      <h1 className="font-serif text-2xl">Models</h1>
      <ModelsBoard initial={initial} canManage={can(user.role, "models.manage")}>
        {report && <ClassMetrics report={report} />}
      </ModelsBoard>
    </section>
  );
}
