import "reflect-metadata";
import pg from "pg";
import { createDataSource } from "../src/data-source.js";

/** Empties the test database and runs every migration from nothing, once per run. */
export default async function setup(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set: run the server tests through `npm test`, which starts a throwaway PostgreSQL.");
  if (/\/hushmark$/.test(url)) throw new Error("Refusing to run tests against the `hushmark` database (the demo data). Use `npm test`.");
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  await client.query("DROP SCHEMA IF EXISTS public CASCADE; CREATE SCHEMA public;");
  await client.end();
  const dataSource = createDataSource(url, { poolSize: 2 });
  await dataSource.initialize();
  await dataSource.runMigrations({ transaction: "each" });
  await dataSource.destroy();
}
