import type { TestProject } from "vitest/node";
import { startStack } from "./stack.js";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    mailApiUrl: string;
    paymentsUrl: string;
  }
}

/**
 * Starts the real stack for the browser tests on a clean `hushmark_e2e` database (migrated and
 * seeded with the demo firm): the fakes and the server serving the built web app.
 */
export default async function setup(project: TestProject) {
  const databaseUrl = process.env.HUSHMARK_E2E_DATABASE_URL;
  if (!databaseUrl) throw new Error("HUSHMARK_E2E_DATABASE_URL is not set: run the browser tests through `npm test`.");
  const stack = await startStack(databaseUrl);
  project.provide("baseUrl", stack.baseUrl);
  project.provide("mailApiUrl", stack.mailApiUrl);
  project.provide("paymentsUrl", stack.paymentsUrl);
  return stack.stop;
}
