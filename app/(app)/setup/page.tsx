import type { Metadata } from "next";
import Link from "next/link";
import { forbidden } from "next/navigation";
import { SETUP_SECTIONS } from "@/components/setup/sections";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/data/current-user";

export const metadata: Metadata = { title: "Setup" };

/** Setup's index: one card per section of components/setup/sections.ts. */
export default async function SetupPage() {
  const { user, allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  const sections = SETUP_SECTIONS.filter((s) => can(user.role, s.permission));
  return (
    <section className="max-w-4xl space-y-4">
      <div>
        <h1 className="font-serif text-2xl">Setup</h1>
        <p className="mt-1 text-sm text-ink-soft">Describe the office: what is filed, for whom, and who may see it. Every change is kept on the setup record (History › Setup record).</p>
      </div>
      <ul className="grid gap-3 sm:grid-cols-2" data-testid="setup-sections">
        {sections.map((s) => (
          <li key={s.href}>
            <Link href={s.href} className="block h-full rounded border border-paper-edge bg-white/70 px-4 py-3 hover:border-verdigris hover:bg-white">
              <span className="font-serif text-lg text-verdigris">{s.label}</span>
              <span className="mt-1 block text-sm text-ink-soft">{s.blurb}</span>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}
