import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { PeopleBoard } from "@/components/people/people-board";
import { requirePageUser } from "@/lib/data/current-user";
import { listPeople } from "@/lib/data/people";

export const metadata: Metadata = { title: "People" };

export default async function PeoplePage() {
  const { user, allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  const people = await listPeople();
  return (
    <section className="space-y-4">
      <div>
        <h1 className="font-serif text-2xl">People</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          Who may sign in, and as what. A new person gets an e-mail with a link to choose their password. A change of role or a deactivation
          takes effect on the person&apos;s next click; deactivation also signs them out everywhere. The office always keeps at least one active
          admin. Every change is on the setup record.
        </p>
      </div>
      <PeopleBoard initial={people} meId={user.id} />
    </section>
  );
}
