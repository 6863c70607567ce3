import { describe, expect, it } from "vitest";
import { cabinetTypeSchema, clientSchema, matterSchema } from "@/lib/validations/setup";

// The schemas the Setup routes and forms share: each refusal is a sentence that says what to do.
const type = { name: "Invoices", description: "Bills the office receives.", keywords: ["invoice"], retentionYears: 7, retentionTrigger: "after_filing", retentionSource: "common practice" };
const messageOf = (r: { success: boolean; error?: { issues: { message: string; path: PropertyKey[] }[] } }) => (r.success ? null : `${r.error!.issues[0].path.join(".")}: ${r.error!.issues[0].message}`);

describe("cabinet type schema", () => {
  it("accepts a complete type and trims its text", () => {
    expect(cabinetTypeSchema.parse({ ...type, name: "  Invoices  " }).name).toBe("Invoices");
  });

  it.each([
    [{ name: "" }, "name: Give the cabinet type a name."],
    [{ description: " " }, /^description: Describe the cabinet type/],
    [{ retentionTrigger: "permanent" }, /^retentionYears: A permanent type keeps documents for good/],
    [{ retentionYears: null }, "retentionYears: Say how many years to keep documents, or choose permanent."],
    [{ retentionYears: 0 }, /^retentionYears: Keep documents at least 1 year/],
    [{ retentionYears: 2.5 }, "retentionYears: Retention years must be a whole number."],
    [{ retentionTrigger: "after_lunch" }, /^retentionTrigger: Choose when retention starts/],
    [{ retentionSource: "" }, /^retentionSource: Say where the retention period comes from/],
    [{ keywords: ["ok", " "] }, "keywords.1: Remove the empty keyword."],
  ])("refuses %j with a sentence", (change, expected) => {
    const msg = messageOf(cabinetTypeSchema.safeParse({ ...type, ...change }));
    if (typeof expected === "string") expect(msg).toBe(expected);
    else expect(msg).toMatch(expected);
  });

  it("accepts permanent without years", () => {
    expect(cabinetTypeSchema.safeParse({ ...type, retentionTrigger: "permanent", retentionYears: null }).success).toBe(true);
  });
});

describe("client schema", () => {
  it("keeps only four digits for a tax ID and refuses a whole number", () => {
    expect(clientSchema.parse({ name: "Heron", taxIdLast4: "0042" }).taxIdLast4).toBe("0042");
    for (const whole of ["123456789", "12-3456789", "123", "12a4"]) {
      expect(messageOf(clientSchema.safeParse({ name: "Heron", taxIdLast4: whole }))).toBe("taxIdLast4: Type only the last four digits of the tax ID (never the whole number), or leave it empty.");
    }
  });

  it("normalises e-mail domains (case, a leading @) and refuses an address", () => {
    expect(clientSchema.parse({ name: "Heron", emailDomains: ["@HeronBoats.Example"] }).emailDomains).toEqual(["heronboats.example"]);
    expect(messageOf(clientSchema.safeParse({ name: "Heron", emailDomains: ["ann@heron.example"] }))).toMatch(/^emailDomains.0: Write each e-mail domain like/);
  });
});

describe("matter schema", () => {
  const matter = { clientId: 1, number: "HB-1", title: "Lease", openedOn: "2026-03-01" };
  it("fills the defaults of a new matter: open, not restricted, no team", () => {
    expect(matterSchema.parse(matter)).toMatchObject({ status: "open", restricted: false, team: [], closedOn: null });
  });

  it.each([
    [{ status: "closed" }, "closedOn: Give the date the matter closed: retention after close runs from it."],
    [{ status: "open", closedOn: "2026-04-01" }, /^closedOn: An open matter has no closed date/],
    [{ status: "closed", closedOn: "2026-02-01" }, "closedOn: The closed date is before the opened date. Check both."],
    [{ openedOn: "2026-02-30" }, "openedOn: Write the opened date as a day like 2026-12-01."],
    [{ number: "" }, "number: Give the matter a number."],
    [{ clientId: undefined }, "clientId: Choose the client."],
  ])("refuses %j with a sentence", (change, expected) => {
    const msg = messageOf(matterSchema.safeParse({ ...matter, ...change }));
    if (typeof expected === "string") expect(msg).toBe(expected);
    else expect(msg).toMatch(expected);
  });
});
