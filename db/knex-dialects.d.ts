// Knex ships no types for its dialect modules; db/timed-client.ts extends the mysql2 one.
declare module "knex/lib/dialects/mysql2/index.js" {
  import type { Knex } from "knex";
  const ClientMySQL2: new (config: Knex.Config) => Knex.Client;
  export default ClientMySQL2;
}
