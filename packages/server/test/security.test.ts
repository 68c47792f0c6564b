import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newFirm, startHarness, type Harness } from "./harness.js";

describe("headers and cross-site requests", () => {
  let h: Harness;
  beforeAll(async () => {
    h = await startHarness();
  });
  afterAll(async () => h.close());

  it("sends a strict content-security policy and the usual helmet headers", async () => {
    const res = await h.request().get("/api/v1/health");
    const csp = res.headers["content-security-policy"] as string;
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-eval'/);
    expect(csp).toContain("base-uri 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
    expect(res.headers["x-powered-by"]).toBeUndefined();
  });

  it("refuses a cross-site form post and a foreign Origin", async () => {
    const { agent } = await newFirm(h);
    const form = await agent.post("/api/v1/projects").type("form").send("title=Sneaky");
    expect(form.status).toBe(415);
    const foreign = await agent.post("/api/v1/projects").set("Origin", "https://evil.example").send({ title: "Sneaky" });
    expect(foreign.status).toBe(403);
    expect(foreign.body.error.code).toBe("cross_site_request");
    const own = await agent.post("/api/v1/projects").set("Origin", "http://hushmark.test").send({ title: "Fine" });
    expect(own.status).toBe(201);
  });

  it("answers health with the database state", async () => {
    const res = await h.request().get("/api/v1/health");
    expect(res.body).toEqual({ status: "ok", database: "ok" });
  });
});

describe("production mode", () => {
  it("has no development inbox", async () => {
    const h = await startHarness();
    try {
      const { createApp } = await import("../src/app.js");
      const { loadConfig } = await import("../src/config.js");
      const config = loadConfig({ ...process.env, NODE_ENV: "production", HUSHMARK_JWT_SECRET: "x".repeat(40), HUSHMARK_LOG_LEVEL: "silent" });
      const { app, close } = createApp({ dataSource: h.dataSource, config, analysisPool: { run: async () => { throw new Error("unused"); }, close: async () => undefined } });
      const supertest = (await import("supertest")).default;
      expect((await supertest(app).get("/dev/mail")).status).toBe(404);
      expect((await supertest(app).get("/api/v1/dev/mail")).status).toBe(404);
      const cookies = (await supertest(app).post("/api/v1/auth/sign-up").send({ firmName: "Prod firm", displayName: "P", email: `prod-${Date.now()}@test.example`, password: "a perfectly fine passphrase" })).headers["set-cookie"] as unknown as string[];
      expect(cookies.every((c) => /; Secure/.test(c))).toBe(true);
      await close();
    } finally {
      await h.close();
    }
  });
});
