import { afterAll, describe, expect, it } from "vitest";
import { createDatabase, dropDatabase } from "@/db/local-server";
import { ownerDb } from "../helpers/db";

// Up, down and up again against the real MariaDB, in a scratch database of its own.
const SCRATCH = "foldwright_migrations_check";

async function tables(db: ReturnType<typeof ownerDb>): Promise<string[]> {
  const [rows] = await db.raw("SHOW TABLES");
  return (rows as Record<string, string>[]).map((r) => Object.values(r)[0]).sort();
}

describe("migrations", () => {
  const db = ownerDb(SCRATCH);
  afterAll(async () => {
    await db.destroy();
    await dropDatabase(SCRATCH);
  });

  it("go up, all the way down, and up again", async () => {
    await dropDatabase(SCRATCH);
    await createDatabase(SCRATCH);
    await db.migrate.latest();
    const up = await tables(db);
    expect(up).toEqual(expect.arrayContaining(["users", "clients", "matters", "matter_members", "cabinet_types"]));

    await db.migrate.rollback(undefined, true);
    expect((await tables(db)).filter((t) => !t.startsWith("knex_"))).toEqual([]);

    await db.migrate.latest();
    expect(await tables(db)).toEqual(up);
  });

  it("store text as utf8mb4 (names with accents and emoji survive)", async () => {
    const [[row]] = await db.raw("SELECT DEFAULT_CHARACTER_SET_NAME AS cs FROM information_schema.SCHEMATA WHERE SCHEMA_NAME = ?", [SCRATCH]);
    expect(row.cs).toBe("utf8mb4");
    await db("clients").insert({ name: "Ångström & Søn 📎", aliases: "[]", email_domains: "[]" });
    expect((await db("clients").first("name")).name).toBe("Ångström & Søn 📎");
  });

  it("grant the app user table-level rights only", async () => {
    const [rows] = await db.raw("SHOW GRANTS FOR 'foldwright_app'@'127.0.0.1'");
    const grants = (rows as Record<string, string>[]).map((r) => Object.values(r)[0]).join("\n");
    expect(grants).toContain(`\`${SCRATCH}\`.\`users\``);
    expect(grants).not.toMatch(new RegExp(`ON \`${SCRATCH}\`\\.\\*`));
  });
});
