import { describe, expect, it } from "vitest";
import { areasFor, can, ROLES } from "@/lib/auth/permissions";

// DESIGN.md §2 is the source of these expectations.
const EXPECTED_AREAS = {
  clerk: ["/intake", "/review", "/cabinets", "/holds"],
  partner: ["/review", "/cabinets", "/holds", "/disposal"],
  admin: ["/intake", "/review", "/cabinets", "/holds", "/disposal", "/history", "/models", "/setup"],
  auditor: ["/cabinets", "/holds", "/disposal", "/history", "/models"],
} as const;

describe("roles", () => {
  it.each(ROLES)("%s sees exactly its areas", (role) => {
    expect(areasFor(role).map((a) => a.href)).toEqual(EXPECTED_AREAS[role]);
  });

  it("auditors never upload, file or change setup", () => {
    for (const p of ["documents.upload", "filing.decide", "setup.manage", "models.manage", "holds.place"] as const) {
      expect(can("auditor", p)).toBe(false);
    }
  });

  it("admins propose disposal; partners and admins approve (DESIGN §2, §3: a second person approves)", () => {
    for (const role of ROLES) {
      expect(can(role, "disposal.propose")).toBe(role === "admin");
      expect(can(role, "disposal.approve")).toBe(role === "admin" || role === "partner");
    }
    expect(can("clerk", "disposal.read")).toBe(false);
  });

  it("only admins change setup and run models", () => {
    for (const role of ROLES) {
      expect(can(role, "setup.manage")).toBe(role === "admin");
      expect(can(role, "models.manage")).toBe(role === "admin");
    }
  });
});
