import { describe, expect, it } from "vitest";
import { loadPaymentsConfig } from "./payments.config.js";

describe("payment settings from the environment", () => {
  it("points the SDK at the local fake outside production", () => {
    expect(loadPaymentsConfig({ NODE_ENV: "development" })).toEqual({ secretKey: "sk_test_hushmark_local", webhookSecret: "whsec_hushmark_local", host: "127.0.0.1", port: 55028, protocol: "http" });
  });

  it("leaves host, port and protocol to the SDK in production, so it talks to the hosted service", () => {
    const c = loadPaymentsConfig({ NODE_ENV: "production", HUSHMARK_STRIPE_SECRET_KEY: "sk_live_abc", HUSHMARK_STRIPE_WEBHOOK_SECRET: "whsec_abc" });
    expect(c).toEqual({ secretKey: "sk_live_abc", webhookSecret: "whsec_abc" });
  });

  it("keeps deposits off in production without keys, and refuses keys of the wrong kind with a readable message", () => {
    expect(loadPaymentsConfig({ NODE_ENV: "production" }).enabled).toBe(false);
    expect(() => loadPaymentsConfig({ HUSHMARK_STRIPE_SECRET_KEY: "pk_test_public" })).toThrow(/must be a secret key/);
    expect(() => loadPaymentsConfig({ HUSHMARK_STRIPE_PORT: "port" })).toThrow(/HUSHMARK_STRIPE_PORT/);
  });
});
