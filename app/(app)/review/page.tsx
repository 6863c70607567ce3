import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { ReviewBoard } from "@/components/review/review-board";
import { listCabinetTypes, listVisibleMatters } from "@/lib/data/catalog";
import { requirePageUser } from "@/lib/data/current-user";

export const metadata: Metadata = { title: "To review" };

export default async function ReviewPage() {
  const { user, allowed } = await requirePageUser("filing.decide");
  if (!allowed) forbidden();
  const [types, matters] = await Promise.all([listCabinetTypes(user, true), listVisibleMatters(user)]);
  return (
    <section>
      <h1 className="font-serif text-2xl">To review</h1>
      <p className="mb-4 mt-1 text-sm text-ink-soft">Accept the suggested cabinet type, pick a runner-up, or file by hand. Every decision goes on the record.</p>
      <ReviewBoard
        types={types.map((t) => ({ id: t.id, name: t.name }))}
        matters={matters.filter((m) => m.status === "open").map(({ id, number, title, clientName }) => ({ id, number, title, clientName }))}
      />
    </section>
  );
}
