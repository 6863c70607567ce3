import { AREAS } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/data/current-user";
import { forbidden } from "next/navigation";
import { NotBuiltYet } from "@/components/shell/coming-soon";

/** A placeholder page for an area: checks the role on the server, then says what is coming. */
export async function AreaPlaceholder({ href }: { href: string }) {
  const area = AREAS.find((a) => a.href === href)!;
  const { allowed } = await requirePageUser(area.permission);
  if (!allowed) forbidden();
  return <NotBuiltYet title={area.label} blurb={area.blurb} />;
}
