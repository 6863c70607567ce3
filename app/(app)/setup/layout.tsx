import { forbidden } from "next/navigation";
import { requirePageUser } from "@/lib/data/current-user";

/**
 * Setup is for admins. The check sits here as well as in each page because the pages stream
 * behind their loading.tsx skeletons: by the time a page runs, the 200 has been sent, so only a
 * check above the skeleton can answer a real 403.
 */
export default async function SetupLayout({ children }: { children: React.ReactNode }) {
  const { allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  return children;
}
