import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { listCabinets, listDocuments } from "@/lib/data/documents";
import type { CurrentUser } from "@/lib/data/users";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";
import { insertReadDocument, typeIds } from "../helpers/filed-documents";

// Browsing filed cabinets through the ethical wall: lists, counts and filters.
const owner = ownerDb();
let clerk: CurrentUser;
let partner: CurrentUser;
let open: number;
let walled: number;
let leases: number;

beforeAll(async () => {
  clerk = await demoUser("clerk@example.com");
  partner = await demoUser("partner@example.com");
  leases = (await typeIds(owner)).get("Contracts & leases")!;
  open = (await owner("matters").where({ number: "AQ-2026-0102" }).first("id")).id;
  walled = (await owner("matters").where({ restricted: true }).first("id")).id;
  const filing = (matterId: number) => ({ cabinet_type_id: leases, matter_id: matterId, filed_by: partner.id, filed_at: new Date(), filed_how: "by_hand" });
  await insertReadDocument(owner, "Shop lease renewal for the bakery premises, term of five years.", "lease-renewal.pdf", filing(open));
  await insertReadDocument(owner, "Carrier termination agreement, confidential settlement terms.", "carrier-settlement.pdf", filing(walled));
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("cabinets", () => {
  it("counts a restricted matter's cabinets only for its team", async () => {
    const forPartner = await listCabinets(partner);
    const forClerk = await listCabinets(clerk);
    expect(forPartner.find((c) => c.matterId === walled && c.cabinetTypeId === leases)?.documents).toBeGreaterThanOrEqual(1);
    expect(forClerk.some((c) => c.matterId === walled)).toBe(false);
    expect(forClerk.find((c) => c.matterId === open && c.cabinetTypeId === leases)?.documents).toBe(forPartner.find((c) => c.matterId === open && c.cabinetTypeId === leases)?.documents);
  });

  it("lists one cabinet's documents and finds them by the words read, never across the wall", async () => {
    const cabinet = await listDocuments(partner, { filed: true, matterId: open, cabinetTypeId: leases, page: 1, pageSize: 50 });
    expect(cabinet.items.map((d) => d.name)).toContain("lease-renewal.pdf");
    expect(cabinet.items.every((d) => d.matter === "AQ-2026-0102" && d.cabinetType === "Contracts & leases" && d.filedBy === "Oluwaseun Hartley")).toBe(true);
    expect((await listDocuments(partner, { filed: true, q: "settlement", page: 1, pageSize: 50 })).items.map((d) => d.name)).toEqual(["carrier-settlement.pdf"]);
    expect(await listDocuments(clerk, { filed: true, q: "settlement", page: 1, pageSize: 50 })).toEqual({ items: [], total: 0 });
  });
});
