import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PASSWORD, mailedToken, newFirm, startHarness, uniqueEmail, type Harness } from "./harness.js";

const cookieValue = (res: { headers: Record<string, unknown> }, name: string) => {
  const cookies = (res.headers["set-cookie"] as string[] | undefined) ?? [];
  return cookies.find((c) => c.startsWith(`${name}=`));
};

describe("sign-up, sign-in and sessions", () => {
  let h: Harness;
  beforeAll(async () => {
    h = await startHarness();
  });
  afterAll(async () => h.close());

  it("signs up a firm and its owner, with httpOnly SameSite cookies", async () => {
    const agent = h.request();
    const email = uniqueEmail("founder");
    const res = await agent.post("/api/v1/auth/sign-up").send({ firmName: "Quietline Acoustics", displayName: "Rhea", email, password: PASSWORD });
    expect(res.status).toBe(201);
    expect(res.body.membership).toMatchObject({ organizationName: "Quietline Acoustics", role: "owner" });
    const access = cookieValue(res, "hm_access");
    expect(access).toMatch(/HttpOnly/);
    expect(access).toMatch(/SameSite=Strict/);
    expect(cookieValue(res, "hm_refresh")).toMatch(/Path=\/api\/v1\/auth/);
    const me = await agent.get("/api/v1/auth/me");
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email);
  });

  it("refuses a common password at sign-up with a reason, and no composition rules", async () => {
    const res = await h.request().post("/api/v1/auth/sign-up").send({ firmName: "Weak firm", displayName: "W", email: uniqueEmail("weak"), password: "Password1234" });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([{ path: "password", message: expect.stringMatching(/too common/) }]);
    const fine = await h.request().post("/api/v1/auth/sign-up").send({ firmName: "Fine firm", displayName: "F", email: uniqueEmail("fine"), password: "all lower case words" });
    expect(fine.status).toBe(201);
  });

  it("stores argon2id at OWASP's cost", async () => {
    const { email } = await newFirm(h);
    const rows: { password_hash: string }[] = await h.dataSource.query("SELECT password_hash FROM users WHERE email = $1", [email]);
    // OWASP Password Storage Cheat Sheet: argon2id, m = 19 MiB (19456 KiB), t = 2, p = 1.
    expect(rows[0]!.password_hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });

  it("answers the same message for a wrong password and an unknown e-mail", async () => {
    const { email } = await newFirm(h);
    const wrong = await h.request().post("/api/v1/auth/sign-in").send({ email, password: "not the right one at all" });
    const unknown = await h.request().post("/api/v1/auth/sign-in").send({ email: uniqueEmail("nobody"), password: "not the right one at all" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it("refuses a second sign-up with the same e-mail with a clear message", async () => {
    const { email } = await newFirm(h);
    const again = await h.request().post("/api/v1/auth/sign-up").send({ firmName: "Other", displayName: "X", email, password: PASSWORD });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already exists/);
  });

  it("rotates the refresh token and revokes the family when an old one comes back", async () => {
    const { agent } = await newFirm(h);
    const first = await agent.post("/api/v1/auth/refresh");
    expect(first.status).toBe(200);
    const stolen = cookieValue(first, "hm_refresh")!.split(";")[0]!;
    const second = await agent.post("/api/v1/auth/refresh");
    expect(second.status).toBe(200);
    // Replaying the token that `second` already used revokes every session of the family.
    const replay = await h.request().post("/api/v1/auth/refresh").set("Cookie", stolen);
    expect(replay.status).toBe(401);
    const afterReplay = await agent.post("/api/v1/auth/refresh");
    expect(afterReplay.status).toBe(401);
    expect((await agent.get("/api/v1/auth/me")).status).toBe(401);
  });

  it("ends every session on sign-out", async () => {
    const { agent, email } = await newFirm(h);
    const other = h.request();
    expect((await other.post("/api/v1/auth/sign-in").send({ email, password: PASSWORD })).status).toBe(200);
    expect((await agent.post("/api/v1/auth/sign-out")).status).toBe(204);
    expect((await agent.get("/api/v1/auth/me")).status).toBe(401);
    expect((await other.get("/api/v1/auth/me")).status).toBe(401);
  });

  it("resets a password by e-mail: the link works once and ends old sessions", async () => {
    const { agent, email } = await newFirm(h);
    const ask = await h.request().post("/api/v1/auth/password-reset/request").send({ email });
    expect(ask.status).toBe(202);
    const askUnknown = await h.request().post("/api/v1/auth/password-reset/request").send({ email: uniqueEmail("ghost") });
    expect(askUnknown.status).toBe(202);
    expect(askUnknown.body).toEqual(ask.body);
    const token = await mailedToken(h, email, "/reset-password/");
    const newPassword = "a brand new passphrase";
    expect((await h.request().post("/api/v1/auth/password-reset").send({ token, password: newPassword })).status).toBe(204);
    expect((await h.request().post("/api/v1/auth/password-reset").send({ token, password: newPassword })).status).toBe(400);
    expect((await agent.get("/api/v1/auth/me")).status).toBe(401);
    expect((await h.request().post("/api/v1/auth/sign-in").send({ email, password: PASSWORD })).status).toBe(401);
    expect((await h.request().post("/api/v1/auth/sign-in").send({ email, password: newPassword })).status).toBe(200);
  });

  it("changes a password only with the current one, and ends other sessions", async () => {
    const { agent, email } = await newFirm(h);
    const other = h.request();
    await other.post("/api/v1/auth/sign-in").send({ email, password: PASSWORD });
    const wrong = await agent.post("/api/v1/auth/password").send({ currentPassword: "wrong wrong wrong", newPassword: "another fine passphrase" });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.details[0].path).toBe("currentPassword");
    const ok = await agent.post("/api/v1/auth/password").send({ currentPassword: PASSWORD, newPassword: "another fine passphrase" });
    expect(ok.status).toBe(204);
    expect((await agent.get("/api/v1/auth/me")).status).toBe(200);
    expect((await other.get("/api/v1/auth/me")).status).toBe(401);
  });

  it("refuses a forged token signed with another algorithm", async () => {
    const header = Buffer.from(JSON.stringify({ alg: "none", typ: "JWT" })).toString("base64url");
    const body = Buffer.from(JSON.stringify({ sub: "x", sid: "y", mid: "z", iss: "hushmark", aud: "hushmark-api" })).toString("base64url");
    const res = await h.request().get("/api/v1/auth/me").set("Cookie", `hm_access=${header}.${body}.`);
    expect(res.status).toBe(401);
  });
});

describe("sign-in rate limit", () => {
  let h: Harness;
  beforeAll(async () => {
    h = await startHarness({ signInLimits: { windowMs: 60_000, perAddress: 1000, perAccountAndAddress: 3, perAccount: 1000 } });
    await h.dataSource.query("DELETE FROM rate_limit_buckets");
  });
  afterAll(async () => {
    await h.dataSource.query("DELETE FROM rate_limit_buckets");
    await h.close();
  });

  it("answers 429 with Retry-After after repeated failures, and only for that account", async () => {
    const { email } = await newFirm(h);
    for (let i = 0; i < 3; i += 1) expect((await h.request().post("/api/v1/auth/sign-in").send({ email, password: "wrong password here" })).status).toBe(401);
    const limited = await h.request().post("/api/v1/auth/sign-in").send({ email, password: PASSWORD });
    expect(limited.status).toBe(429);
    expect(Number(limited.headers["retry-after"])).toBeGreaterThan(0);
    expect(limited.body.error.code).toBe("too_many_attempts");
    const { email: otherEmail } = await newFirm(h);
    expect((await h.request().post("/api/v1/auth/sign-in").send({ email: otherEmail, password: PASSWORD })).status).toBe(200);
  });
});
