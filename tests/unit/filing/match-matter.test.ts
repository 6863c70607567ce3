import { describe, expect, it } from "vitest";
import { decideMatter, matchMatters, type MatterRecord } from "@/lib/filing/match-matter";

// An invented office: one client with two matters, one with a closed and an open matter, and
// two single-matter clients.
const MATTERS: MatterRecord[] = [
  { id: 1, number: "AQ-2026-0101", title: "2025 bookkeeping and tax return", clientName: "Marlowe Street Bakery LLC", aliases: ["Marlowe Bakery"], emailDomains: ["marlowebakery.example"], taxIdLast4: "4417", status: "open" },
  { id: 2, number: "AQ-2026-0102", title: "Shop lease renewal", clientName: "Marlowe Street Bakery LLC", aliases: ["Marlowe Bakery"], emailDomains: ["marlowebakery.example"], taxIdLast4: "4417", status: "open" },
  { id: 3, number: "AQ-2026-0117", title: "Trust administration", clientName: "Ostrander Family Trust", aliases: ["Ostrander Trust"], emailDomains: ["ostrander.example"], taxIdLast4: "9031", status: "open" },
  { id: 4, number: "AQ-2024-0042", title: "Carrier dispute", clientName: "Ravelston Freight Co.", aliases: ["RFC Logistics"], emailDomains: ["ravelston.example"], taxIdLast4: "7750", status: "closed" },
  { id: 5, number: "AQ-2026-0131", title: "Warehouse purchase", clientName: "Ravelston Freight Co.", aliases: ["RFC Logistics"], emailDomains: ["ravelston.example"], taxIdLast4: "7750", status: "open" },
  { id: 6, number: "AQ-2026-0123", title: "Payroll and employment matters", clientName: "Pellucid Dental Group PC", aliases: ["Pellucid Dental"], emailDomains: ["pelluciddental.example"], taxIdLast4: "2268", status: "open" },
];

const match = (text: string, fileName = "scan.pdf") => matchMatters(text, fileName, MATTERS);
const ids = (text: string, fileName?: string) => match(text, fileName).map((c) => c.matterId);

describe("matchMatters", () => {
  it("decides on a matter number and says so", () => {
    const candidates = match("Re: AQ-2026-0117 — quarterly accounting for the beneficiaries.");
    expect(candidates[0]).toMatchObject({ matterId: 3, reasons: ["matter number AQ-2026-0117"] });
    expect(candidates[0].score).toBeCloseTo(0.9);
    expect(decideMatter(candidates)).toEqual({ matterId: 3, ambiguous: false });
  });

  it("reads matter numbers written with spaces, other dashes, no separators or in the file name", () => {
    expect(ids("our ref aq 2026 0101")[0]).toBe(1);
    expect(ids("Ref. AQ–2026–0101 (see attached)")[0]).toBe(1);
    expect(ids("Ref AQ20260101")[0]).toBe(1);
    const fromName = match("Please countersign.", "AQ_2026_0102-lease.pdf");
    expect(fromName[0]).toMatchObject({ matterId: 2, reasons: ["matter number AQ-2026-0102"] });
    // Glued to more digits it is another number.
    expect(match("Ref AQ-2026-01019 and XAQ-2026-0101")).toEqual([]);
  });

  it("splits a client's name between its matters and calls the choice ambiguous", () => {
    const candidates = match("Invoice for MARLOWE STREET BAKERY, L.L.C., 14 Quay Road.");
    expect(candidates.map((c) => c.matterId).sort()).toEqual([1, 2]);
    expect(candidates[0].score).toBeCloseTo(0.3);
    expect(candidates[1].score).toBeCloseTo(0.3);
    expect(candidates[0].reasons).toContain("client name “Marlowe Street Bakery LLC”");
    expect(decideMatter(candidates)).toEqual({ matterId: null, ambiguous: true });
  });

  it("lets matter title words pin one matter of the client", () => {
    const candidates = match("Marlowe Bakery: draft lease renewal for the shop on Quay Road. Contact: ana@marlowebakery.example");
    expect(candidates[0].matterId).toBe(2);
    expect(candidates[0].reasons).toEqual(["client name “Marlowe Bakery”", "e-mail domain marlowebakery.example", "matter title words “shop lease renewal”"]);
    expect(candidates[1]).toMatchObject({ matterId: 1, reasons: expect.arrayContaining(["another matter of this client fits better"]) });
    expect(decideMatter(candidates)).toEqual({ matterId: 2, ambiguous: false });
  });

  it("needs two distinctive title words to pin, so one common word does not", () => {
    const common = match("Marlowe Bakery: we will keep the originals unless you ask us to return them.");
    expect(decideMatter(common)).toEqual({ matterId: null, ambiguous: true });
    const pinned = match("Marlowe Bakery: your 2025 tax return is ready to sign.");
    expect(pinned[0]).toMatchObject({ matterId: 1, reasons: expect.arrayContaining(["matter title words “tax return”"]) });
    expect(decideMatter(pinned)).toEqual({ matterId: 1, ambiguous: false });
  });

  it("combines name, e-mail and tax ID evidence for a single-matter client (noisy-OR)", () => {
    const [best] = match("Ostrander Trust\nFrom: kit@mail.ostrander.example\nTaxpayer EIN xx-xxx9031");
    expect(best.matterId).toBe(3);
    expect(best.score).toBeCloseTo(1 - 0.5 * 0.5 * 0.4);
    expect(best.reasons).toEqual(["client name “Ostrander Trust”", "e-mail domain ostrander.example", "tax ID ending 9031"]);
  });

  it("accepts the usual ways of writing a tax ID ending, and no random four digits", () => {
    for (const text of ["EIN …2268", "EIN ...2268", "SSN ***-**-2268", "TIN ending in 2268", "last four digits of the EIN: 2268", "EIN 47-1232268", "XX-XXX2268"]) {
      expect(ids(text), text).toEqual([6]);
    }
    for (const text of ["Invoice 2268", "PO Box 2268", "card ending 2268", "Account number ****2268", "2268 units at $4.10", "$12,268.00"]) {
      expect(ids(text), text).toEqual([]);
    }
  });

  it("matches names on word boundaries only, and e-mail domains exactly or by subdomain", () => {
    expect(ids("Ravelston Freightways Inc. sent a quote")).toEqual([]);
    expect(ids("write to billing@notostrander.example or ostrander.example.fake@x.example")).toEqual([]);
    expect(ids("CC: pay@hr.pelluciddental.example")).toEqual([6]);
  });

  it("scores a closed matter lower than an open one of the same client", () => {
    const candidates = match("RFC Logistics — freight audit");
    expect(candidates.map((c) => c.matterId)).toEqual([5, 4]);
    expect(candidates[1].score).toBeLessThan(candidates[0].score);
    expect(candidates[1].reasons).toContain("matter is closed");
    // Named by number, a closed matter still wins, at a lower score.
    const named = match("Final bill, matter AQ-2024-0042");
    expect(named[0].matterId).toBe(4);
    expect(named[0].score).toBeCloseTo(0.9 * 0.75);
    expect(decideMatter(named)).toEqual({ matterId: 4, ambiguous: false });
  });

  it("calls two equally named clients ambiguous", () => {
    const candidates = match("Meeting between Ostrander Family Trust and Pellucid Dental Group, P.C.");
    expect(candidates.map((c) => c.matterId).sort()).toEqual([3, 6]);
    expect(decideMatter(candidates)).toEqual({ matterId: null, ambiguous: true });
  });

  it("finds nothing in a document with no identifiers", () => {
    expect(match("Weather report for the harbour: light winds, 14 degrees.")).toEqual([]);
    expect(match("")).toEqual([]);
    expect(decideMatter([])).toEqual({ matterId: null, ambiguous: false });
  });

  it("keeps every score in 0..1 and sorts best first", () => {
    const candidates = match("AQ-2026-0101 Marlowe Bakery, EIN xx-xxx4417, tax return; also Ostrander Trust and RFC Logistics");
    expect(candidates.length).toBeGreaterThan(3);
    for (const c of candidates) {
      expect(c.score).toBeGreaterThan(0);
      expect(c.score).toBeLessThanOrEqual(1);
    }
    expect(candidates.map((c) => c.score)).toEqual([...candidates.map((c) => c.score)].sort((a, b) => b - a));
    expect(candidates[0].matterId).toBe(1);
  });
});

describe("decideMatter", () => {
  it("refuses a weak best and a best that leads by too little", () => {
    expect(decideMatter([{ matterId: 1, score: 0.45, reasons: [] }])).toEqual({ matterId: null, ambiguous: true });
    expect(decideMatter([{ matterId: 1, score: 0.8, reasons: [] }, { matterId: 2, score: 0.7, reasons: [] }])).toEqual({ matterId: null, ambiguous: true });
    expect(decideMatter([{ matterId: 1, score: 0.8, reasons: [] }, { matterId: 2, score: 0.6, reasons: [] }])).toEqual({ matterId: 1, ambiguous: false });
  });
});
