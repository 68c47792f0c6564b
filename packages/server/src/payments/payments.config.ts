import { z } from "zod";

const envSchema = z.object({
  NODE_ENV: z.string().optional(),
  HUSHMARK_STRIPE_SECRET_KEY: z.string().regex(/^sk_(test|live)_\S+$/, "HUSHMARK_STRIPE_SECRET_KEY must be a secret key (sk_test_… or sk_live_…)").optional(),
  HUSHMARK_STRIPE_WEBHOOK_SECRET: z.string().regex(/^whsec_\S+$/, "HUSHMARK_STRIPE_WEBHOOK_SECRET must start with whsec_").optional(),
  HUSHMARK_STRIPE_HOST: z.string().optional(),
  HUSHMARK_STRIPE_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  HUSHMARK_STRIPE_PROTOCOL: z.enum(["http", "https"]).optional(),
});

/** How the server reaches the payment service: the hosted one in production, the local fake otherwise. */
export interface PaymentsConfig {
  /** False in production until both keys are set: deposits then answer 503 and say what is missing. */
  enabled?: boolean;
  secretKey: string;
  webhookSecret: string;
  /** Unset: the SDK's own default (the hosted service). */
  host?: string;
  port?: number;
  protocol?: "http" | "https";
}

/**
 * Reads the payment settings. Outside production the defaults point at the local payments fake
 * (127.0.0.1:55028 over http, test keys); in production the SDK talks to the hosted service unless
 * host/port/protocol are set, and deposits stay off until both keys are set.
 */
export function loadPaymentsConfig(env: NodeJS.ProcessEnv = process.env): PaymentsConfig {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) throw new Error(`Hushmark's payment settings are not valid:\n${parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n")}`);
  const e = parsed.data;
  const production = e.NODE_ENV === "production";
  // A firm may run without online deposits; test keys must never stand in for real ones in production.
  if (production && (!e.HUSHMARK_STRIPE_SECRET_KEY || !e.HUSHMARK_STRIPE_WEBHOOK_SECRET)) {
    return { enabled: false, secretKey: "sk_live_unset", webhookSecret: "whsec_unset" };
  }
  const host = e.HUSHMARK_STRIPE_HOST ?? (production ? undefined : "127.0.0.1");
  const port = e.HUSHMARK_STRIPE_PORT ?? (production ? undefined : 55028);
  const protocol = e.HUSHMARK_STRIPE_PROTOCOL ?? (production ? undefined : "http");
  return {
    secretKey: e.HUSHMARK_STRIPE_SECRET_KEY ?? "sk_test_hushmark_local",
    webhookSecret: e.HUSHMARK_STRIPE_WEBHOOK_SECRET ?? "whsec_hushmark_local",
    ...(host ? { host } : {}),
    ...(port ? { port } : {}),
    ...(protocol ? { protocol } : {}),
  };
}
