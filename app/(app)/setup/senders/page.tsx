import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { SendersBoard } from "@/components/people/senders-board";
import { requirePageUser } from "@/lib/data/current-user";
import { listPeople } from "@/lib/data/people";
import { listSenders } from "@/lib/data/senders";
import { env } from "@/lib/env";

export const metadata: Metadata = { title: "Allowed senders" };

export default async function SendersPage() {
  const { allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  const [senders, people] = await Promise.all([listSenders(), listPeople()]);
  const uploaders = people.filter((p) => p.state === "active" && (p.role === "clerk" || p.role === "admin")).map(({ id, name, email }) => ({ id, name, email }));
  return (
    <section className="space-y-4">
      <div>
        <h1 className="font-serif text-2xl">Allowed senders</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          Copiers and people who may e-mail scans to <span className="font-mono">{env.mail.intakeAddress}</span>. Each attachment becomes a document
          exactly as if dropped at Intake, and the sender gets a receipt. A sender whose address is a person&apos;s files as that person (refused when
          the account is deactivated or its role may not upload); any other allowed sender files as the person chosen here. Mail from anyone else is refused.
        </p>
        <p className="mt-2 max-w-3xl text-xs text-ink-faint">
          A sender&apos;s address can be forged. Let only your own mail server (which checks the sending domain) pass mail to Foldwright&apos;s intake port.
        </p>
      </div>
      <SendersBoard initial={senders} uploaders={uploaders} />
    </section>
  );
}
