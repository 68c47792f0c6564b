// Writes docs/plan-document.schema.json from the zod plan schema; `--check` fails when the file is stale.
// Run from packages/floorplan: npx tsx scripts/write-json-schema.ts [--check]
import { readFileSync, writeFileSync } from "node:fs";
import { dirname, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { PLAN_JSON_SCHEMA_PATH, planJsonSchemaText } from "../src/exchange/plan-json-schema.js";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../../..");
const target = resolve(root, PLAN_JSON_SCHEMA_PATH);
const text = planJsonSchemaText();
if (process.argv.includes("--check")) {
  let current = "";
  try {
    current = readFileSync(target, "utf8");
  } catch {
    // A missing file is stale too.
  }
  if (current !== text) {
    console.error(`${PLAN_JSON_SCHEMA_PATH} is out of date: run npx tsx scripts/write-json-schema.ts`);
    process.exit(1);
  }
  console.log(`${PLAN_JSON_SCHEMA_PATH} is up to date`);
} else {
  writeFileSync(target, text);
  console.log(`wrote ${PLAN_JSON_SCHEMA_PATH} (${text.length} characters)`);
}
