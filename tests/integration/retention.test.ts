import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { getDocument } from "@/lib/data/documents";
import { placeHold, releaseHold } from "@/lib/data/holds";
import { dueOnSql } from "@/lib/data/retention-sql";
import { impactOfClosingDate, impactOfTypeRule } from "@/lib/data/retention";
import type { CurrentUser } from "@/lib/data/users";
import { addYears, utcDay } from "@/lib/records/retention-date";
import { ownerDb } from "../helpers/db";
import { insertReadDocument } from "../helpers/filed-documents";
import { demoUser } from "../helpers/users";

// The retention date shown (lib/records/retention-date.ts) against the one the lists filter on
// (MariaDB's DATE_ADD in lib/data/retention-sql.ts), and the impact counts Setup shows.
const owner = ownerDb();
let admin: CurrentUser, clerk: CurrentUser;
let matterId: number;
let closeType: number;
let copyType: number;

async function sqlDueOn(documentId: number): Promise<string | null> {
  const r = await owner("documents as d")
    .leftJoin("cabinet_types as c", "c.id", "d.cabinet_type_id")
    .leftJoin("matters as m", "m.id", "d.matter_id")
    .where("d.id", documentId)
    .first(owner.raw(`${dueOnSql()} AS due`));
  return r.due ? utcDay(r.due) : null;
}

async function fileIn(typeId: number, filedAt: Date, label: string): Promise<number> {
  return insertReadDocument(owner, `Retention fixture ${label}`, `${label}.pdf`, { cabinet_type_id: typeId, matter_id: matterId, filed_at: filedAt, filed_how: "by_hand", filed_by: admin.id });
}

beforeAll(async () => {
  [admin, clerk] = await Promise.all([demoUser("admin@example.com"), demoUser("clerk@example.com")]);
  const client = await owner("clients").where({ name: "Ostrander Family Trust" }).first("id");
  [matterId] = await owner("matters").insert({ client_id: client.id, number: "AQ-2019-0311", title: "Closed estate file (retention test)", status: "closed", opened_on: "2018-04-01", closed_on: "2020-02-29" });
  const type = (name: string, years: number, trigger: string) =>
    owner("cabinet_types").insert({ name, description: `${name} (test)`, keywords: "[]", retention_years: years, retention_trigger: trigger, retention_source: "Test rule." }).then(([id]) => id as number);
  closeType = await type("Test estate correspondence", 7, "after_matter_close");
  copyType = await type("Test convenience copies", 7, "after_filing");
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("retention dates", () => {
  it("our year arithmetic is MariaDB's DATE_ADD, 29 February included", async () => {
    // The real MariaDB server is the outside reference here (its DATE_ADD clamps the day to the
    // end of the month, as its manual says for YEAR intervals — from memory).
    const cases: [string, number][] = [["2020-02-29", 1], ["2020-02-29", 4], ["2020-02-29", 0], ["2020-02-29", 80], ["2019-01-31", 1], ["2023-12-31", 7], ["2024-02-28", 1], ["1996-02-29", 4]];
    for (const [day, years] of cases) {
      const [[row]] = await owner.raw("SELECT DATE_FORMAT(DATE_ADD(?, INTERVAL ? YEAR), '%Y-%m-%d') AS d", [day, years]);
      expect(`${day}+${years}: ${addYears(day, years)}`).toBe(`${day}+${years}: ${row.d}`);
    }
  });

  it("the date on the page is the date the filters use, before and after the matter is reopened", async () => {
    const doc = await fileIn(closeType, new Date("2019-05-02T09:30:00Z"), "estate-letter");
    const copy = await fileIn(copyType, new Date("2024-02-29T23:59:00Z"), "leap-copy");
    expect((await getDocument(admin, doc)).retention).toEqual({ dueOn: "2027-02-28", basis: "after_matter_close", rule: "7 years after the matter closes" });
    expect(await sqlDueOn(doc)).toBe("2027-02-28");
    expect((await getDocument(admin, copy)).retention.dueOn).toBe("2031-02-28");
    expect(await sqlDueOn(copy)).toBe("2031-02-28");

    await owner("matters").where({ id: matterId }).update({ status: "open" }); // reopened, old closing date kept
    try {
      expect((await getDocument(admin, doc)).retention).toMatchObject({ dueOn: null, basis: "matter_open" });
      expect(await sqlDueOn(doc)).toBeNull();
      expect((await getDocument(admin, copy)).retention.dueOn).toBe("2031-02-28"); // after filing: unchanged
    } finally {
      await owner("matters").where({ id: matterId }).update({ status: "closed" });
    }
  });
});

describe("impact of a change, before it is saved", () => {
  it("a type's new rule: how many dates change, how many fall due, how many stop being due, holds counted", async () => {
    const now = new Date();
    const ago = (years: number) => new Date(Date.UTC(now.getUTCFullYear() - years, now.getUTCMonth(), 1, 12));
    const ids = [await fileIn(copyType, ago(10), "copy-old"), await fileIn(copyType, ago(2), "copy-two"), await fileIn(copyType, now, "copy-new")];
    const before = await impactOfTypeRule(admin, { cabinetTypeId: copyType, trigger: "after_filing", years: 7 });
    expect(before).toMatchObject({ changed: 0, newlyDue: 0, noLongerDue: 0 }); // the same rule changes nothing
    const zero = await impactOfTypeRule(admin, { cabinetTypeId: copyType, trigger: "after_filing", years: 0 });
    expect(zero).toMatchObject({ documents: before.documents, changed: before.documents, newlyDue: before.documents - 1, noLongerDue: 0, newlyDueHeld: 0 });
    const forever = await impactOfTypeRule(admin, { cabinetTypeId: copyType, trigger: "permanent" });
    expect(forever).toMatchObject({ changed: before.documents, noLongerDue: 1, newlyDue: 0 }); // only copy-old was due

    const hold = await placeHold(admin, { documentId: ids[1], reason: "Request from the auditor", reference: "AUD-3" });
    try {
      expect((await impactOfTypeRule(admin, { cabinetTypeId: copyType, trigger: "after_filing", years: 0 })).newlyDueHeld).toBe(1);
    } finally {
      await releaseHold(admin, hold.id, "Answered");
    }
  });

  it("a matter's new closing date, or reopening it, moves the after-closing dates only", async () => {
    const n = (await owner("documents").where({ matter_id: matterId, cabinet_type_id: closeType }).whereNull("disposed_at").count({ n: "id" }))[0].n;
    const earlier = await impactOfClosingDate(admin, { matterId, closedOn: "2010-06-30" }); // + 7 years: due since 2017
    expect(earlier).toMatchObject({ changed: Number(n), newlyDue: Number(n), noLongerDue: 0 });
    const reopened = await impactOfClosingDate(admin, { matterId, closedOn: null });
    expect(reopened).toMatchObject({ changed: Number(n), newlyDue: 0 });
    expect(reopened.documents).toBeGreaterThan(Number(n)); // after-filing documents counted, not changed
  });

  it("says nothing of a restricted matter to someone outside its team", async () => {
    const walled = await owner("matters").where({ number: "AQ-2026-0131" }).first("id");
    await expect(impactOfClosingDate(clerk, { matterId: walled.id, closedOn: "2020-01-01" })).rejects.toMatchObject({ status: 404 });
  });
});
