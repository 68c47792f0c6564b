import type { ValueTransformer } from "typeorm";

/** PostgreSQL numeric arrives as a string (exact); the app computes in numbers and rounds money to cents. */
export const decimal: ValueTransformer = {
  to: (v: number | null | undefined) => v,
  from: (v: string | null) => (v === null ? null : Number(v)),
};

/** Rounds to cents (half away from zero), so totals add up the way a printed proposal does. */
export const cents = (amount: number): number => Math.sign(amount) * Math.round(Math.abs(amount) * 100 + 1e-9) / 100;
