import { InitialSchema1796149875228 } from "./1796149875228-InitialSchema.js";

/** Every migration in order; a new one is generated with `npm run -w @hushmark/server migration:generate -- src/migrations/Name` and appended here. */
export const migrations = [InitialSchema1796149875228];
