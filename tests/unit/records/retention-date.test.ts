import { describe, expect, it } from "vitest";
import { addDays, addYears, describeRule, isDue, retentionDate, retentionStanding } from "@/lib/records/retention-date";
import { retentionImpact } from "@/lib/records/retention-impact";

const filed = (filedOn: string, matterStatus: "open" | "closed" | null = "open", matterClosedOn: string | null = null) => ({ filedOn, matterStatus, matterClosedOn });

describe("addYears", () => {
  it("takes 29 February to 28 February in a common year", () => {
    // Java SE LocalDate.plusYears documentation: "2008-02-29 (leap year) plus one year would
    // result in the invalid date 2009-02-29 (standard year) … the last valid day of the month,
    // 2009-02-28, is selected instead" (from memory). MariaDB's DATE_ADD does the same; the
    // integration test retention.test.ts checks that against the real server.
    expect(addYears("2008-02-29", 1)).toBe("2009-02-28");
    expect(addYears("2024-02-29", 1)).toBe("2025-02-28");
  });

  it("keeps 29 February when the target year is a leap year, and knows 2100 is not one", () => {
    // Gregorian calendar rule (ISO 8601 uses it): a year divisible by 4 is a leap year, except
    // centuries not divisible by 400 — 2028 is, 2100 is not, 2000 was.
    expect(addYears("2024-02-29", 4)).toBe("2028-02-29");
    expect(addYears("2096-02-29", 4)).toBe("2100-02-28");
    expect(addYears("1996-02-29", 4)).toBe("2000-02-29");
  });

  it("adds zero years as the same day, and refuses negative or fractional periods and bad dates", () => {
    expect(addYears("2026-03-31", 0)).toBe("2026-03-31");
    expect(() => addYears("2026-03-31", -1)).toThrow(/whole number/);
    expect(() => addYears("2026-03-31", 1.5)).toThrow(/whole number/);
    expect(() => addYears("2025-02-29", 1)).toThrow(/calendar date/);
    expect(() => addYears("31/03/2026", 1)).toThrow(/calendar date/);
  });

  it("counts days across a month and a leap day", () => {
    // 2028 is a leap year (Gregorian rule above): 1 February + 29 days is 1 March only in a leap year.
    expect(addDays("2028-02-01", 29)).toBe("2028-03-01");
    expect(addDays("2027-02-01", 29)).toBe("2027-03-02");
  });
});

describe("retentionDate", () => {
  const sevenAfterFiling = { years: 7, trigger: "after_filing" as const };
  const sevenAfterClose = { years: 7, trigger: "after_matter_close" as const };

  it("after filing: the filing day plus the years, whatever the matter does", () => {
    // The worked example of the demo's "Invoices & receipts" rule: filed 15 March 2019, 7 years → 15 March 2026.
    expect(retentionDate(sevenAfterFiling, filed("2019-03-15"))).toEqual({ dueOn: "2026-03-15", basis: "after_filing" });
    expect(retentionDate(sevenAfterFiling, filed("2019-03-15", "closed", "2019-06-30")).dueOn).toBe("2026-03-15");
  });

  it("after the matter closes: none while open, the closing day plus the years once closed", () => {
    expect(retentionDate(sevenAfterClose, filed("2019-03-15", "open"))).toEqual({ dueOn: null, basis: "matter_open" });
    expect(retentionDate(sevenAfterClose, filed("2019-03-15", "closed", "2020-02-29"))).toEqual({ dueOn: "2027-02-28", basis: "after_matter_close" });
  });

  it("a matter closed and then reopened has no date again; closed again later, the new closing day counts", () => {
    // Common practice: a reopened matter is live work again, so its retention clock starts over
    // from the next closing. The reopened matter is "open" with the old closing day still on it.
    const closedOnce = filed("2018-05-02", "closed", "2019-01-10");
    expect(retentionDate(sevenAfterClose, closedOnce).dueOn).toBe("2026-01-10");
    expect(retentionDate(sevenAfterClose, { ...closedOnce, matterStatus: "open" })).toEqual({ dueOn: null, basis: "matter_open" });
    expect(retentionDate(sevenAfterClose, { ...closedOnce, matterClosedOn: "2023-08-31" }).dueOn).toBe("2030-08-31");
  });

  it("a closed matter without a closing day gives no date and says why", () => {
    expect(retentionDate(sevenAfterClose, filed("2019-03-15", "closed", null))).toEqual({ dueOn: null, basis: "matter_no_closing_date" });
  });

  it("permanent: never a date; not filed: never a date", () => {
    expect(retentionDate({ years: null, trigger: "permanent" }, filed("2001-01-01"))).toEqual({ dueOn: null, basis: "permanent" });
    expect(retentionDate({ years: 5, trigger: "permanent" }, filed("2001-01-01")).dueOn).toBeNull();
    expect(retentionDate(sevenAfterFiling, { filedOn: null, matterStatus: null, matterClosedOn: null })).toEqual({ dueOn: null, basis: "not_filed" });
  });

  it("zero years: due on the day it was filed (convenience copies; common practice)", () => {
    const d = retentionDate({ years: 0, trigger: "after_filing" }, filed("2026-12-02"));
    expect(d.dueOn).toBe("2026-12-02");
    expect(isDue(d.dueOn, "2026-12-02")).toBe(true);
    expect(isDue(d.dueOn, "2026-12-01")).toBe(false);
  });

  it("a changed rule moves the date it drives", () => {
    const facts = filed("2020-02-29", "closed", "2021-06-30");
    expect(retentionDate({ years: 7, trigger: "after_filing" }, facts).dueOn).toBe("2027-02-28");
    expect(retentionDate({ years: 3, trigger: "after_filing" }, facts).dueOn).toBe("2023-02-28");
    expect(retentionDate({ years: 3, trigger: "after_matter_close" }, facts).dueOn).toBe("2024-06-30");
    expect(retentionDate({ years: null, trigger: "permanent" }, facts).dueOn).toBeNull();
  });
});

describe("standing and words", () => {
  it("sorts a date into past due, due within 90 days, later, none", () => {
    expect(retentionStanding("2026-12-02", "2026-12-02")).toBe("past_due");
    expect(retentionStanding("2027-03-02", "2026-12-02")).toBe("due_soon"); // 90 days after 2 December 2026
    expect(retentionStanding("2027-03-03", "2026-12-02")).toBe("later");
    expect(retentionStanding(null, "2026-12-02")).toBe("none");
  });

  it("says the rule in words", () => {
    expect(describeRule({ years: 1, trigger: "after_filing" })).toBe("1 year after filing");
    expect(describeRule({ years: 7, trigger: "after_matter_close" })).toBe("7 years after the matter closes");
    expect(describeRule({ years: null, trigger: "permanent" })).toBe("Kept permanently");
  });
});

describe("retentionImpact", () => {
  it("counts changed dates and documents that become due or stop being due", () => {
    const today = "2026-12-02";
    const impact = retentionImpact(
      [
        { before: "2030-01-01", after: "2026-01-01" }, // changed, newly due
        { before: "2025-01-01", after: null }, // changed, no longer due
        { before: "2027-01-01", after: "2027-01-01" }, // unchanged
        { before: null, after: "2031-01-01" }, // changed, not due
      ],
      today,
    );
    expect(impact).toEqual({ documents: 4, changed: 3, newlyDue: 1, noLongerDue: 1 });
  });
});
