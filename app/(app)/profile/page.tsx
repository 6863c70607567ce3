import type { Metadata } from "next";
import { NoticeSwitches } from "@/components/people/notice-switches";
import { requirePageUser } from "@/lib/data/current-user";
import { getNoticeSettings } from "@/lib/data/notices";
import { env } from "@/lib/env";

export const metadata: Metadata = { title: "Your profile" };

const ROLE_NAMES = { clerk: "Clerk", partner: "Partner", admin: "Admin", auditor: "Auditor" } as const;

export default async function ProfilePage() {
  const { user } = await requirePageUser();
  const notices = await getNoticeSettings(user);
  const hour = `${String(env.mail.digestHour).padStart(2, "0")}:00`;
  const switches = [
    ...(user.role === "clerk" || user.role === "partner"
      ? [{ key: "digest" as const, label: "Daily To review digest", help: `At ${hour} (${env.retrain.timeZone}) on days when documents wait for you: how many, the oldest, the lowest confidence.` }]
      : []),
    ...(user.role === "admin" ? [{ key: "retrainAlerts" as const, label: "Retraining alerts", help: "When a retraining is not promoted or fails, with the reason." }] : []),
    { key: "scanReceipts" as const, label: "Receipts of scans I e-mail", help: `What became of each attachment you send to ${env.mail.intakeAddress}.` },
  ];
  return (
    <section className="max-w-2xl space-y-4">
      <div>
        <h1 className="font-serif text-2xl">Your profile</h1>
        <p className="mt-1 text-sm text-ink-soft">
          {user.name} · {ROLE_NAMES[user.role]} · <span className="font-mono">{user.email}</span>. To change your password, sign out and use
          &ldquo;Forgot your password?&rdquo; on the sign-in page; an admin changes names and roles.
        </p>
      </div>
      <NoticeSwitches initial={notices} switches={switches} />
    </section>
  );
}
