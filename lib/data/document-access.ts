import "server-only";
// The ethical wall for documents: a document in a restricted matter is visible only to that
// matter's team and to admins — in lists, searches, counts, downloads and duplicate answers.
import type { Knex } from "knex";
import type { CurrentUser } from "@/lib/data/users";

/** Adds the visibility condition; the query must join `matters as m` on documents.matter_id. */
export function whereDocumentVisible(q: Knex.QueryBuilder, user: CurrentUser): Knex.QueryBuilder {
  if (user.role === "admin") return q;
  return q.where((w) =>
    w
      .whereNull("m.id")
      .orWhere("m.restricted", false)
      .orWhereExists((e) => e.select(e.client.raw("1")).from("matter_members as mm").whereRaw("mm.matter_id = m.id").where("mm.user_id", user.id)),
  );
}

export function documentsWithMatters(db: Knex): Knex.QueryBuilder {
  return db("documents as d").leftJoin("matters as m", "m.id", "d.matter_id");
}
