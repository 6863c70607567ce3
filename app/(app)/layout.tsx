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
    <div className="md:flex md:min-h-screen">
      {/* Narrow screens (a phone): the rail folds into a menu at the top. */}
      <details className="group border-b border-paper-edge bg-paper-deep/60 md:hidden" data-testid="rail-menu">
        <summary className="flex cursor-pointer list-none items-center justify-between px-4 py-3">
          <span className="font-serif text-xl">Foldwright</span>
          <span className="rounded border border-paper-edge bg-white/70 px-3 py-1 text-sm">Menu</span>
        </summary>
        <div className="px-3 pb-3">
          <Rail items={items} />
          <UserBlock user={user} narrow />
        </div>
      </details>
      <aside className="sticky top-0 hidden h-screen w-44 shrink-0 flex-col border-r border-paper-edge bg-paper-deep/60 px-3 py-4 md:flex lg:w-52">
        <p className="mb-5 px-3 font-serif text-xl">Foldwright</p>
        <Rail items={items} />
        <div className="mt-auto">
          <UserBlock user={user} />
        </div>
      </aside>
      <main className="min-w-0 flex-1 overflow-x-auto px-4 py-4 md:px-6 md:py-6 lg:px-8">{children}</main>
    </div>
  );
}

/** Who is signed in, with Sign out; the test ids only on the wide rail's copy (the one tests read). */
function UserBlock({ user, narrow = false }: { user: { name: string; email: string; role: keyof typeof ROLE_NAMES }; narrow?: boolean }) {
  return (
        <div className="border-t border-paper-edge px-3 pt-3 text-xs text-ink-soft">
          <Link href="/profile" className="font-medium text-ink hover:underline" data-testid={narrow ? undefined : "current-user"} title="Your profile and notices">{user.name}</Link>
          <p>
            <span data-testid={narrow ? undefined : "current-role"}>{ROLE_NAMES[user.role]}</span> · {user.email}
          </p>
          <form action={signOutAction} className="mt-2">
            <button type="submit" className="text-verdigris underline-offset-2 hover:underline">
              Sign out
            </button>
          </form>
        </div>
  );
}
