// Runs every pending migration (`npm run -w @hushmark/server migrate`). Used by npm start and npm test.
import "reflect-metadata";
import { createDataSource } from "../data-source.js";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set.");
  process.exit(2);
}
const dataSource = createDataSource(url, { poolSize: 2 });
await dataSource.initialize();
const ran = await dataSource.runMigrations({ transaction: "each" });
console.log(ran.length ? `migrations ran: ${ran.map((m) => m.name).join(", ")}` : "migrations: nothing to run");
await dataSource.destroy();
