import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { cookies } from "next/headers";
import { parseQueueQuery, QUERY_COOKIE, queueSearchParams } from "@/components/review/queue-query";
import { ReviewBoard } from "@/components/review/review-board";
import { listCabinetTypes, listVisibleMatters } from "@/lib/data/catalog";
import { requirePageUser } from "@/lib/data/current-user";

export const metadata: Metadata = { title: "To review" };

export default async function ReviewPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { user, allowed } = await requirePageUser("filing.decide");
  if (!allowed) forbidden();
  const [types, matters, params] = await Promise.all([listCabinetTypes(user, true), listVisibleMatters(user), searchParams]);
  // A bare /review (from the rail) takes up the query this browser last used; an address with a query wins.
  const fromAddress = queueSearchParams(parseQueueQuery(params)).size > 0;
  const remembered = (await cookies()).get(QUERY_COOKIE)?.value;
  const initialQuery = parseQueueQuery(fromAddress || !remembered ? params : new URLSearchParams(remembered));
  return (
    <section>
      <h1 className="font-serif text-2xl">To review</h1>
      <p className="mb-4 mt-1 text-sm text-ink-soft">Accept the suggested cabinet type, pick a runner-up, or file by hand. Every decision goes on the record.</p>
      <ReviewBoard
        initialQuery={initialQuery}
        types={types.map((t) => ({ id: t.id, name: t.name }))}
        matters={matters.filter((m) => m.status === "open").map(({ id, number, title, clientName }) => ({ id, number, title, clientName }))}
      />
    </section>
  );
}
