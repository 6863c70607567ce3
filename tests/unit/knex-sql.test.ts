import { describe, expect, it } from "vitest";
import knex from "knex";

// Query shapes checked with .toSQL() (no connection needed).
const k = knex({ client: "mysql2" });

describe("query shapes", () => {
  it("quotes database, table and user in the per-table grants", () => {
    const sql = k.raw("GRANT SELECT, INSERT ON ??.?? TO ?@?", ["foldwright", "filing_events", "app", "127.0.0.1"]).toSQL();
    expect(sql.sql).toBe("GRANT SELECT, INSERT ON `foldwright`.`filing_events` TO ?@?");
    expect(sql.bindings).toEqual(["app", "127.0.0.1"]);
  });

  it("increments failed sign-ins atomically in the database, not read-modify-write", () => {
    const sql = k("users").where({ id: 7 }).increment("failed_sign_ins", 1).toSQL();
    expect(sql.sql).toBe("update `users` set `failed_sign_ins` = `failed_sign_ins` + ? where `id` = ?");
  });
});
