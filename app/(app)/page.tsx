import { redirect } from "next/navigation";
import { areasFor } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/data/current-user";

/** Home is the first area the role may use. */
export default async function HomePage() {
  const { user } = await requirePageUser();
  redirect(areasFor(user.role)[0]?.href ?? "/cabinets");
}
