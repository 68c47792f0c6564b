import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "@hushmark/fakes";
import { PASSWORD, uniqueEmail } from "./harness.js";
import { clearRateLimits } from "./support/server-process.js";

const serverDir = fileURLToPath(new URL("..", import.meta.url));
// Every editor retries until its save is in, so the requests grow with the square of this; the
// 50-editor run is the load benchmark (`npm run bench`).
const EDITORS = 20;

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer();
    s.listen(0, "127.0.0.1", () => {
      const a = s.address();
      s.close(() => resolve(typeof a === "object" && a ? a.port : 0));
    });
  });

/** A tiny cookie-keeping client for one person, talking to whichever process it is given. */
function person() {
  let cookies = new Map<string, string>();
  return {
    async call(base: string, method: string, path: string, body?: unknown) {
      const res = await fetch(`${base}${path}`, {
        method,
        headers: { "content-type": "application/json", cookie: [...cookies].map(([k, v]) => `${k}=${v}`).join("; ") },
        ...(body === undefined ? {} : { body: JSON.stringify(body) }),
      });
      for (const c of res.headers.getSetCookie()) {
        const [pair] = c.split(";");
        const [k, v] = pair!.split("=");
        if (v) cookies.set(k!, v);
        else cookies.delete(k!);
      }
      const text = await res.text();
      return { status: res.status, body: text ? JSON.parse(text) : null };
    },
    cookieSnapshot: () => new Map(cookies),
    restore: (snapshot: Map<string, string>) => {
      cookies = new Map(snapshot);
    },
  };
}

describe("two server processes against one database", () => {
  const procs: ChildProcess[] = [];
  const bases: string[] = [];
  let mail: MailFake;

  beforeAll(async () => {
    await clearRateLimits();
    mail = await startMailFake();
    for (let i = 0; i < 2; i += 1) {
      const port = await freePort();
      const child = spawn("node", ["dist/index.js"], {
        cwd: serverDir,
        env: {
          ...process.env,
          NODE_ENV: "test",
          HUSHMARK_PORT: String(port),
          HUSHMARK_PUBLIC_URL: "http://hushmark.test",
          HUSHMARK_JWT_SECRET: "a shared secret for both processes, 32+ chars",
          HUSHMARK_SMTP_PORT: String(mail.smtpPort),
          HUSHMARK_LOG_LEVEL: "silent",
        },
        stdio: "ignore",
      });
      procs.push(child);
      bases.push(`http://127.0.0.1:${port}`);
    }
    for (const base of bases) {
      for (let i = 0; i < 100; i += 1) {
        if (await fetch(`${base}/api/v1/health`).then((r) => r.ok, () => false)) break;
        await new Promise((r) => setTimeout(r, 100));
      }
    }
  });
  afterAll(async () => {
    for (const p of procs) p.kill("SIGTERM");
    await mail.close();
  });

  it("share sessions and refresh-token families: a session made on one is honoured and revoked on the other", async () => {
    const [a, b] = bases as [string, string];
    const owner = person();
    expect((await owner.call(a, "POST", "/api/v1/auth/sign-up", { firmName: "Two Process Firm", displayName: "Olu", email: uniqueEmail("two"), password: PASSWORD })).status).toBe(201);
    expect((await owner.call(b, "GET", "/api/v1/auth/me")).status).toBe(200);
    const project = await owner.call(b, "POST", "/api/v1/projects", { title: "Seen from both" });
    expect((await owner.call(a, "GET", `/api/v1/projects/${project.body.id}`)).body.title).toBe("Seen from both");
    const before = owner.cookieSnapshot();
    expect((await owner.call(a, "POST", "/api/v1/auth/refresh")).status).toBe(200);
    const thief = person();
    thief.restore(before);
    // The used token replayed on the other process revokes the family there too.
    expect((await thief.call(b, "POST", "/api/v1/auth/refresh")).status).toBe(401);
    expect((await owner.call(a, "POST", "/api/v1/auth/refresh")).status).toBe(401);
  });

  it("never overwrites a save silently: 20 editors on two processes, every accepted save is a revision", async () => {
    const [a, b] = bases as [string, string];
    const owner = person();
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
