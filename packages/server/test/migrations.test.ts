import "reflect-metadata";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createDataSource } from "../src/data-source.js";

// Runs the migrations in a schema of its own, so the shared test schema is left alone.
const SCHEMA = "migration_check";

describe("migrations", () => {
  const url = new URL(process.env.DATABASE_URL!);
  url.searchParams.set("options", `-c search_path=${SCHEMA}`);
  const dataSource = createDataSource(url.toString(), { poolSize: 1 });

  beforeAll(async () => {
    const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await client.connect();
    await client.query(`DROP SCHEMA IF EXISTS ${SCHEMA} CASCADE; CREATE SCHEMA ${SCHEMA};`);
    await client.end();
    await dataSource.initialize();
  });
  afterAll(async () => {
    await dataSource.query(`DROP SCHEMA IF EXISTS ${SCHEMA} CASCADE`);
    await dataSource.destroy();
  });

  it("run from an empty database and leave no difference between entities and schema", async () => {
    const ran = await dataSource.runMigrations({ transaction: "each" });
    expect(ran.length).toBeGreaterThan(0);
    const tables: { table_name: string }[] = await dataSource.query("SELECT table_name FROM information_schema.tables WHERE table_schema = $1", [SCHEMA]);
    expect(tables.map((t) => t.table_name)).toEqual(expect.arrayContaining(["organizations", "users", "memberships", "projects", "plans", "plan_revisions", "audit_events"]));
    const pending = await dataSource.driver.createSchemaBuilder().log();
    expect(pending.upQueries.map((q) => q.query)).toEqual([]);
  });

  it("undo cleanly, every one of them, touching nothing outside their own schema", async () => {
    const publicIndexes = () => dataSource.query("SELECT indexname FROM pg_indexes WHERE schemaname = 'public' ORDER BY indexname");
    const before = await publicIndexes();
    for (let i = 0; i < dataSource.migrations.length; i += 1) await dataSource.undoLastMigration({ transaction: "each" });
    const tables: { table_name: string }[] = await dataSource.query(
      "SELECT table_name FROM information_schema.tables WHERE table_schema = $1 AND table_name <> 'typeorm_migrations'",
      [SCHEMA],
    );
    expect(tables).toEqual([]);
    // A `down` naming "public" explicitly would drop the shared test schema's indexes (or production's).
    expect(await publicIndexes()).toEqual(before);
  });
});
