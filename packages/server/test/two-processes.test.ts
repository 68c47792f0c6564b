import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "@hushmark/fakes";
import { PASSWORD, uniqueEmail } from "./harness.js";
import { clearRateLimits, client, startServerProcess, type ServerProcess } from "./support/server-process.js";

// Every editor retries until its save is in, so the requests grow with the square of this; the
// 50-editor run is the load benchmark (`npm run bench`).
const EDITORS = 20;

describe("two server processes against one database", () => {
  const procs: ServerProcess[] = [];
  const bases: string[] = [];
  let mail: MailFake;

  beforeAll(async () => {
    await clearRateLimits();
    mail = await startMailFake();
    const env = { HUSHMARK_PUBLIC_URL: "http://hushmark.test", HUSHMARK_JWT_SECRET: "a shared secret for both processes, 32+ chars", HUSHMARK_SMTP_PORT: String(mail.smtpPort), HUSHMARK_LOG_LEVEL: "silent" };
    procs.push(...(await Promise.all([startServerProcess(env), startServerProcess(env)])));
    bases.push(...procs.map((p) => p.base));
  });
  afterAll(async () => {
    await Promise.all(procs.map((p) => p.kill("SIGTERM")));
    await mail.close();
  });

  it("share sessions and refresh-token families: a session made on one is honoured and revoked on the other", async () => {
    const [a, b] = bases as [string, string];
    const owner = client();
    expect((await owner.call(a, "POST", "/api/v1/auth/sign-up", { firmName: "Two Process Firm", displayName: "Olu", email: uniqueEmail("two"), password: PASSWORD })).status).toBe(201);
    expect((await owner.call(b, "GET", "/api/v1/auth/me")).status).toBe(200);
    const project = await owner.call(b, "POST", "/api/v1/projects", { title: "Seen from both" });
    expect((await owner.call(a, "GET", `/api/v1/projects/${project.body.id}`)).body.title).toBe("Seen from both");
    const before = owner.cookieSnapshot();
    expect((await owner.call(a, "POST", "/api/v1/auth/refresh")).status).toBe(200);
    const thief = client();
    thief.restore(before);
    // The used token replayed on the other process revokes the family there too.
    expect((await thief.call(b, "POST", "/api/v1/auth/refresh")).status).toBe(401);
    expect((await owner.call(a, "POST", "/api/v1/auth/refresh")).status).toBe(401);
  });

  it("never overwrites a save silently: 20 editors on two processes, every accepted save is a revision", async () => {
    const [a, b] = bases as [string, string];
    const owner = client();
    await owner.call(a, "POST", "/api/v1/auth/sign-up", { firmName: "Busy Firm", displayName: "Ines", email: uniqueEmail("busy"), password: PASSWORD });
    const projectId = (await owner.call(a, "POST", "/api/v1/projects", { title: "Contested plan" })).body.id as string;
    const start = (await owner.call(a, "GET", `/api/v1/projects/${projectId}/plan`)).body;
    const told: { editor: number; version: number; name: string }[] = [];
    let conflicts = 0;
    await Promise.all(
      Array.from({ length: EDITORS }, async (_, editor) => {
        const base = editor % 2 ? b : a;
        let current = start as { version: number; document: Record<string, unknown> };
        for (let attempt = 0; attempt < 200; attempt += 1) {
          const name = `editor ${editor}, try ${attempt}`;
          const res = await owner.call(base, "PUT", `/api/v1/projects/${projectId}/plan`, { baseVersion: current.version, document: { ...current.document, name } });
          if (res.status === 200) {
            told.push({ editor, version: res.body.version, name });
            return;
          }
          expect(res.status).toBe(409);
          conflicts += 1;
          // Back off a little, differently per editor, as the editor's autosave does.
          await new Promise((r) => setTimeout(r, 3 + (editor % 7) * 2));
          current = (await owner.call(base, "GET", `/api/v1/projects/${projectId}/plan`)).body;
        }
        throw new Error(`editor ${editor} never got a save in`);
      }),
    );
    expect(told).toHaveLength(EDITORS);
    expect(conflicts).toBeGreaterThan(0);
    const versions = told.map((t) => t.version).sort((x, y) => x - y);
    expect(versions).toEqual(Array.from({ length: EDITORS }, (_, i) => i + 1));
    const revisions = (await owner.call(b, "GET", `/api/v1/projects/${projectId}/plan/revisions`)).body.revisions as { version: number }[];
    expect(revisions.map((r) => r.version).sort((x, y) => x - y)).toEqual(versions);
    for (const t of told.filter((_, i) => i % 7 === 0)) {
      const rev = await owner.call(a, "GET", `/api/v1/projects/${projectId}/plan/revisions/${t.version}`);
      expect(rev.body.document.name).toBe(t.name);
    }
  });
});
