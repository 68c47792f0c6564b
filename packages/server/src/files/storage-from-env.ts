import { loadConfig } from "../config.js";
import { createObjectStorage, type ObjectStorage } from "./object-storage.js";

/**
 * The object store named by the environment, for code that runs outside the app (a migration that
 * moves bytes). It signs nothing, so a missing session secret does not stop it.
 */
export function storageFromEnvironment(env: NodeJS.ProcessEnv = process.env): ObjectStorage {
  const config = loadConfig({ ...env, DATABASE_URL: env.DATABASE_URL ?? "unused", HUSHMARK_JWT_SECRET: env.HUSHMARK_JWT_SECRET ?? "a-migration-signs-nothing-0123456789abcdef" });
  return createObjectStorage(config.s3);
}
