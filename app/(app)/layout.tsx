import Link from "next/link";
import { Rail } from "@/components/shell/rail";
import { areasFor } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/data/current-user";
import { signOutAction } from "@/app/(auth)/sign-in/actions";

const ROLE_NAMES = { clerk: "Clerk", partner: "Partner", admin: "Admin", auditor: "Auditor" } as const;

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const { user } = await requirePageUser();
  const items = areasFor(user.role).map(({ href, label }) => ({ href, label }));
  return (
    <div className="flex min-h-screen">
      <aside className="sticky top-0 flex h-screen w-52 shrink-0 flex-col border-r border-paper-edge bg-paper-deep/60 px-3 py-4">
        <p className="mb-5 px-3 font-serif text-xl">Foldwright</p>
        <Rail items={items} />
        <div className="mt-auto border-t border-paper-edge px-3 pt-3 text-xs text-ink-soft">
          <Link href="/profile" className="font-medium text-ink hover:underline" data-testid="current-user" title="Your profile and notices">{user.name}</Link>
          <p>
            <span data-testid="current-role">{ROLE_NAMES[user.role]}</span> · {user.email}
          </p>
          <form action={signOutAction} className="mt-2">
            <button type="submit" className="text-verdigris underline-offset-2 hover:underline">
              Sign out
            </button>
          </form>
        </div>
      </aside>
      <main className="min-w-0 flex-1 px-8 py-6">{children}</main>
    </div>
  );
}
