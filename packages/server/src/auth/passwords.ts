import argon2 from "argon2";

export interface Argon2Cost {
  memoryCost: number;
  timeCost: number;
  parallelism: number;
}

/** argon2id PHC hash at the given cost (OWASP Password Storage Cheat Sheet: m=19 MiB, t=2, p=1 minimum). */
export function hashPassword(password: string, cost: Argon2Cost): Promise<string> {
  return argon2.hash(password, { type: argon2.argon2id, ...cost });
}

/** Verifies a password against a stored PHC hash; false on any malformed hash. */
export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | undefined;

/** Spends the same time as a real check so a sign-in for an unknown e-mail is not faster. */
export async function verifyAgainstDummy(password: string, cost: Argon2Cost): Promise<false> {
  dummyHash ??= hashPassword("not-a-real-password-for-timing", cost);
  await verifyPassword(await dummyHash, password);
  return false;
}
