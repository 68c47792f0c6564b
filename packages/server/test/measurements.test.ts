import sharp from "sharp";
import type supertest from "supertest";
import wavefile from "wavefile";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startS3Fake, type S3Fake } from "@hushmark/fakes";
import { sineSamples } from "@hushmark/acoustics";
import { addMember, newFirm, startHarness, type Harness } from "./harness.js";

const { WaveFile } = wavefile;
const JOBS_SCHEMA = `pgboss_measurements_${process.pid}`;

/** A WAV file of a 1 kHz tone of RMS 0.1 (−20 dB re full scale) in the given format. */
function toneWav(opts: { seconds: number; rate: number; channels: 1 | 2; depth: "16" | "24" | "32f"; burst?: { at: number; len: number } }): Buffer {
  const n = Math.round(opts.seconds * opts.rate);
  const quiet = sineSamples(1000, 0.001, opts.rate, n);
  const loud = sineSamples(1000, 0.1, opts.rate, n);
  const x = opts.burst ? quiet.map((v, i) => (i >= opts.burst!.at * opts.rate && i < (opts.burst!.at + opts.burst!.len) * opts.rate ? loud[i]! : v)) : loud;
  const scale = opts.depth === "16" ? 32767 : opts.depth === "24" ? 8388607 : 1;
  const channel = opts.depth === "32f" ? Float64Array.from(x) : Int32Array.from(x, (v) => Math.round(v * scale));
  const w = new WaveFile();
  w.fromScratch(opts.channels, opts.rate, opts.depth, opts.channels === 1 ? channel : [channel, channel]);
  return Buffer.from(w.toBuffer());
}

const fields = { label: "Night by the party wall", kind: "receiver_side", takenAt: "2026-05-01T23:00:00Z", calibrationDb: "94", device: "recorder", roomId: "room-booth", pointX: "2.5", pointY: "1" };

function upload(agent: supertest.Agent, projectId: string, file: Buffer, name: string, extra: Record<string, string> = fields) {
  const req = agent.post(`/api/v1/projects/${projectId}/recordings`).set("x-hushmark-upload", "1");
  for (const [k, v] of Object.entries(extra)) req.field(k, v);
  return req.attach("file", file, name);
}

async function waitReady(agent: supertest.Agent, projectId: string, id: string, seen: number[] = [], timeoutMs = 60_000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const res = await agent.get(`/api/v1/projects/${projectId}/measurements/${id}`);
    seen.push(res.body.progress);
    if (res.body.status !== "processing") return res.body;
    if (Date.now() > until) throw new Error(`still processing at ${res.body.progress}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

describe("brief, measurements, recordings and photos", () => {
  let s3: S3Fake;
  let h: Harness;
  let owner: supertest.Agent;
  let surveyor: supertest.Agent;
  let projectId: string;

  beforeAll(async () => {
    s3 = await startS3Fake();
    process.env.HUSHMARK_S3_ENDPOINT = s3.endpoint;
    process.env.HUSHMARK_S3_BUCKET = "hushmark-test";
    process.env.HUSHMARK_JOBS_SCHEMA = JOBS_SCHEMA;
    process.env.HUSHMARK_MAX_RECORDING_MB = "8";
    process.env.HUSHMARK_MAX_PHOTO_MB = "1";
    h = await startHarness();
    owner = (await newFirm(h, "Measure Firm")).agent;
    surveyor = (await addMember(h, owner, "surveyor")).agent;
    projectId = (await owner.post("/api/v1/projects").send({ title: "Fernhollow studio" })).body.id;
  });
  afterAll(async () => {
    await h.close();
    const { createDataSource } = await import("../src/data-source.js");
    const ds = createDataSource(process.env.DATABASE_URL!, { poolSize: 1 });
    await ds.initialize();
    await ds.query(`DROP SCHEMA IF EXISTS ${JOBS_SCHEMA} CASCADE`);
    await ds.destroy();
    await s3.close();
  });

  it("saves the brief with a version and refuses a stale save", async () => {
    const first = await surveyor.get(`/api/v1/projects/${projectId}/brief`);
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(0);
    expect(first.body.brief.noises).toEqual([]);
    const brief = {
      noises: [{ id: "n1", kind: "machinery_hum", where: "café condenser on the back wall", direction: "keep_out", times: ["night"], days: ["mon", "tue"] }],
      target: { kind: "nc", nc: 20 },
      budget: { amount: 8000, currency: "EUR" },
      accepts: { liningDepth: { value: 8, unit: "cm" }, tenure: "tenant" },
    };
    const saved = await surveyor.put(`/api/v1/projects/${projectId}/brief`).send({ baseVersion: 0, brief });
    expect(saved.status).toBe(200);
    expect(saved.body.version).toBe(1);
    expect(saved.body.brief.accepts.structuralWork).toBe(false);
    const stale = await owner.put(`/api/v1/projects/${projectId}/brief`).send({ baseVersion: 0, brief });
    expect(stale.status).toBe(409);
    expect(stale.body.error.details.currentVersion).toBe(1);
    const bad = await surveyor.put(`/api/v1/projects/${projectId}/brief`).send({ baseVersion: 1, brief: { target: { kind: "nc", nc: 3 } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe("brief.target.nc");
  });

  it("previews a spectrum file without saving, then saves what was confirmed, and exports it", async () => {
    const text = "Frequency [Hz];Leq [dB];Lmax [dB]\n100;45,5;52\n125;abc;50\n1000;38,2;44,1\n6300;30;31\n";
    const preview = await surveyor.post(`/api/v1/projects/${projectId}/measurements/csv-preview`).send({ text });
    expect(preview.status).toBe(200);
    expect(preview.body.rows).toHaveLength(2);
    expect(preview.body.problems.map((p: { line: number }) => p.line)).toEqual([3, 5]);
    expect((await surveyor.get(`/api/v1/projects/${projectId}/measurements`)).body.measurements).toHaveLength(0);
    const created = await surveyor.post(`/api/v1/projects/${projectId}/measurements`).send({
      label: "Studio, before", kind: "before_work", takenAt: "2026-04-30T10:00:00Z", source: "csv", roomId: "room-studio", point: { x: 2.5, y: 1 },
      leqDb: preview.body.leqDb, lmaxDb: preview.body.lmaxDb,
    });
    expect(created.status).toBe(201);
    expect(created.body.leqDb[3]).toBe(45.5);
    const exported = await owner.get(`/api/v1/projects/${projectId}/measurements/${created.body.id}/csv`);
    expect(exported.status).toBe(200);
    expect(exported.headers["content-type"]).toMatch(/text\/csv/);
    expect(exported.text).toContain("100,45.5,52.0");
    expect(exported.text).toContain("1000,38.2,44.1");
    // A calibration change moves every level with it.
    const moved = await surveyor.patch(`/api/v1/projects/${projectId}/measurements/${created.body.id}`).send({ calibrationDb: 2 });
    expect(moved.body.leqDb[3]).toBe(47.5);
  });

  it("refuses a WAV that is really a PNG, and saves nothing", async () => {
    const png = await sharp({ create: { width: 4, height: 4, channels: 3, background: "#1f7a74" } }).png().toBuffer();
    const res = await upload(surveyor, projectId, png, "night.wav");
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/not a WAV recording.*PNG/);
    const files = await h.dataSource.query("SELECT count(*)::int AS n FROM stored_files WHERE project_id = $1", [projectId]);
    expect(files[0].n).toBe(0);
  });

  it("refuses an over-size upload with 413 and a clear message", async () => {
    const big = Buffer.alloc(9 * 1024 * 1024, 1);
    const res = await upload(surveyor, projectId, big, "long.wav").catch((e: { response?: supertest.Response }) => e.response!);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe("too_large");
    expect(res.body.error.message).toMatch(/larger than the 8 MB limit for a WAV recording/);
    const files = await h.dataSource.query("SELECT count(*)::int AS n FROM stored_files WHERE project_id = $1", [projectId]);
    expect(files[0].n).toBe(0);
  });

  it("stops reading an upload that grows past the limit without announcing its size (413)", async () => {
    const boundary = "----hushmark-test-boundary";
    const req = surveyor.post(`/api/v1/projects/${projectId}/recordings`).set("x-hushmark-upload", "1").set("content-type", `multipart/form-data; boundary=${boundary}`);
    req.write(`--${boundary}\r\ncontent-disposition: form-data; name="file"; filename="endless.wav"\r\ncontent-type: audio/wav\r\n\r\n`);
    for (let i = 0; i < 10; i++) req.write(Buffer.alloc(1024 * 1024, 7));
    const res = await new Promise<supertest.Response>((resolve) => req.end((_err, r) => resolve(r)));
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/8 MB limit/);
  });

  it("leaves no file and no record when an upload is cut off", async () => {
    const { readdir } = await import("node:fs/promises");
    const { tmpdir } = await import("node:os");
    const dir = `${tmpdir()}/hushmark-uploads`;
    const before = new Set(await readdir(dir).catch(() => []));
    const boundary = "----hushmark-cut-boundary";
    const req = surveyor.post(`/api/v1/projects/${projectId}/recordings`).set("x-hushmark-upload", "1").set("content-type", `multipart/form-data; boundary=${boundary}`);
    req.on("error", () => undefined);
    req.write(`--${boundary}\r\ncontent-disposition: form-data; name="file"; filename="cut.wav"\r\ncontent-type: audio/wav\r\n\r\n`);
    req.write(toneWav({ seconds: 2, rate: 8000, channels: 1, depth: "16" }));
    // The connection drops mid-file: no closing boundary ever arrives.
    await new Promise((r) => setTimeout(r, 150));
    const during = (await readdir(dir).catch(() => [])).filter((f) => !before.has(f));
    expect(during).toHaveLength(1);
    req.abort();
    await new Promise((r) => setTimeout(r, 500));
    const left = (await readdir(dir).catch(() => [])).filter((f) => !before.has(f));
    expect(left).toEqual([]);
    const files = await h.dataSource.query("SELECT count(*)::int AS n FROM stored_files WHERE project_id = $1", [projectId]);
    expect(files[0].n).toBe(0);
  });

  it("refuses an upload without the upload header as a cross-site form would send it", async () => {
    const res = await surveyor.post(`/api/v1/projects/${projectId}/recordings`).field("label", "x").attach("file", Buffer.from("RIFF"), "a.wav");
    expect(res.status).toBe(415);
  });

  it("analyses a stereo 16-bit recording in a job whose progress reaches 100 %", async () => {
    const wav = toneWav({ seconds: 20, rate: 44_100, channels: 2, depth: "16", burst: { at: 8, len: 4 } });
    const res = await upload(surveyor, projectId, wav, "../../etc/passwd.wav");
    expect(res.status, JSON.stringify(res.body)).toBe(202);
    expect(res.body.status).toBe("processing");
    const seen: number[] = [];
    const done = await waitReady(surveyor, projectId, res.body.id, seen);
    expect(done.error).toBeNull();
    expect(done.status).toBe("ready");
    expect(done.progress).toBe(1);
    expect(seen.every((p, i) => i === 0 || p >= seen[i - 1]!)).toBe(true);
    // The loud 4 s at −20 dB re full scale, +94 dB calibration: Leq over 20 s is 74 + 10·lg(4/20) = 67.0 dB [derived].
    expect(Math.abs(done.leqDb[13] - 67)).toBeLessThan(0.5);
    expect(Math.abs(done.lmaxDb[13] - 74)).toBeLessThan(0.5);
    expect(done.summary.durationS).toBeCloseTo(20, 1);
    expect(done.summary.channels).toBe(2);
    expect(done.roomId).toBe("room-booth");
    expect(done.point).toEqual({ x: 2.5, y: 1 });
    expect(done.events).toHaveLength(1);
    expect(Math.abs(done.events[0].startS - 8)).toBeLessThanOrEqual(1);
    expect(done.events[0].dominantBandHz).toBe(1000);
    expect(done.history.laeqDb).toHaveLength(20);
    const key = await h.dataSource.query("SELECT object_key, original_name, state, sha256 FROM stored_files WHERE id = (SELECT file_id FROM measurements WHERE id = $1)", [done.id]);
    expect(key[0].object_key).not.toContain("passwd");
    expect(key[0].state).toBe("stored");
    expect(key[0].sha256).toMatch(/^[0-9a-f]{64}$/);
    // Play back the event: an excerpt WAV with exactly the asked-for frames.
    const clip = await surveyor.get(`/api/v1/projects/${projectId}/measurements/${done.id}/audio?startS=8&durationS=0.5`).buffer(true).parse((r, cb) => {
      const parts: Buffer[] = [];
      r.on("data", (c: Buffer) => parts.push(c));
      r.on("end", () => cb(null, Buffer.concat(parts)));
    });
    expect(clip.status).toBe(200);
    const body = clip.body as Buffer;
    expect(body.length).toBe(44 + 22_050 * 4);
    const back = new WaveFile(body);
    expect((back.fmt as { sampleRate: number }).sampleRate).toBe(44_100);
  });

  it("leaves bands of digital silence empty", async () => {
    const w = new WaveFile();
    w.fromScratch(1, 8000, "16", new Int16Array(8000 * 2));
    const res = await upload(surveyor, projectId, Buffer.from(w.toBuffer()), "silence.wav");
    const done = await waitReady(surveyor, projectId, res.body.id);
    expect(done.status).toBe("ready");
    expect(done.leqDb.every((v: number | null) => v === null)).toBe(true);
  });

  it("reads 24-bit and 32-bit float recordings at other rates", async () => {
    for (const [depth, rate] of [["24", 48_000], ["32f", 16_000]] as const) {
      const res = await upload(surveyor, projectId, toneWav({ seconds: 3, rate, channels: 1, depth }), "short.wav");
      expect(res.status).toBe(202);
      const done = await waitReady(surveyor, projectId, res.body.id);
      expect(done.status, depth).toBe("ready");
      expect(Math.abs(done.leqDb[13] - 74), depth).toBeLessThan(0.5);
    }
  });

  it("keeps photos with thumbnails, checked by content", async () => {
    const m = (await surveyor.get(`/api/v1/projects/${projectId}/measurements`)).body.measurements[0];
    const jpeg = await sharp({ create: { width: 1200, height: 800, channels: 3, background: "#c98a12" } }).jpeg().toBuffer();
    const res = await surveyor.post(`/api/v1/projects/${projectId}/photos`).set("x-hushmark-upload", "1").field("measurementId", m.id).field("caption", "gap under the door").attach("file", jpeg, "door.jpg");
    expect(res.status).toBe(201);
    expect(res.body.width).toBe(1200);
    const thumb = await owner.get(`/api/v1/projects/${projectId}/photos/${res.body.id}/image?size=thumb`).buffer(true).parse((r, cb) => {
      const parts: Buffer[] = [];
      r.on("data", (c: Buffer) => parts.push(c));
      r.on("end", () => cb(null, Buffer.concat(parts)));
    });
    expect(thumb.headers["content-type"]).toBe("image/jpeg");
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(320);
    const text = await surveyor.post(`/api/v1/projects/${projectId}/photos`).set("x-hushmark-upload", "1").field("elementId", "wall-3").attach("file", Buffer.from("just text, not a photo"), "leak.jpg");
    expect(text.status).toBe(415);
    const loose = await surveyor.post(`/api/v1/projects/${projectId}/photos`).set("x-hushmark-upload", "1").attach("file", jpeg, "door.jpg");
    expect(loose.status).toBe(400);
    expect(loose.body.error.details[0].message).toMatch(/plan element or a measurement/);
    expect((await owner.get(`/api/v1/projects/${projectId}/photos`)).body.photos).toHaveLength(1);
  });

  it("deletes a measurement with its recording and its photos' files", async () => {
    const rec = await upload(surveyor, projectId, toneWav({ seconds: 2, rate: 8000, channels: 1, depth: "16" }), "short.wav");
    await waitReady(surveyor, projectId, rec.body.id);
    const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#1d2433" } }).jpeg().toBuffer();
    const photo = await surveyor.post(`/api/v1/projects/${projectId}/photos`).set("x-hushmark-upload", "1").field("measurementId", rec.body.id).attach("file", jpeg, "vent.jpg");
    expect(photo.status).toBe(201);
    const owned = async () => (await h.dataSource.query(
      "SELECT count(*)::int AS n FROM stored_files WHERE id IN (SELECT file_id FROM measurements WHERE id = $1) OR id IN (SELECT file_id FROM photos WHERE measurement_id = $1) OR id IN (SELECT thumbnail_file_id FROM photos WHERE measurement_id = $1)",
      [rec.body.id],
    ))[0].n as number;
    expect(await owned()).toBe(3);
    const before = (await h.dataSource.query("SELECT count(*)::int AS n FROM stored_files WHERE project_id = $1", [projectId]))[0].n as number;
    expect((await surveyor.delete(`/api/v1/projects/${projectId}/measurements/${rec.body.id}`)).status).toBe(204);
    const after = (await h.dataSource.query("SELECT count(*)::int AS n FROM stored_files WHERE project_id = $1", [projectId]))[0].n as number;
    expect(before - after).toBe(3);
    expect((await owner.get(`/api/v1/projects/${projectId}/photos/${photo.body.id}/image`)).status).toBe(404);
  });

  it("hides another firm's measurements (404)", async () => {
    const other = (await newFirm(h, "Other Firm")).agent;
    const m = (await surveyor.get(`/api/v1/projects/${projectId}/measurements`)).body.measurements[0];
    expect((await other.get(`/api/v1/projects/${projectId}/measurements`)).status).toBe(404);
    expect((await other.get(`/api/v1/projects/${projectId}/measurements/${m.id}`)).status).toBe(404);
  });

  it("completes a job interrupted by a server restart", async () => {
    await h.close();
    // A slowed worker, so the restart lands mid-job.
    h = await startHarness({ measurements: { recordingJob: { chunkDelayMs: 60 } } });
    const agent = h.request();
    const signIn = await agent.post("/api/v1/auth/sign-up").send({ firmName: "Restart Firm", displayName: "Owner", email: `restart-${process.pid}@test.example`, password: "a perfectly fine passphrase" });
    expect(signIn.status).toBe(201);
    const project = (await agent.post("/api/v1/projects").send({ title: "Restart" })).body.id;
    const res = await upload(agent, project, toneWav({ seconds: 60, rate: 16_000, channels: 1, depth: "16" }), "long.wav");
    expect(res.status).toBe(202);
    for (let i = 0; i < 200; i++) {
      const p = (await agent.get(`/api/v1/projects/${project}/measurements/${res.body.id}`)).body.progress;
      if (p > 0.05) break;
      await new Promise((r) => setTimeout(r, 100));
    }
    const before = (await agent.get(`/api/v1/projects/${project}/measurements/${res.body.id}`)).body;
    expect(before.status).toBe("processing");
    expect(before.progress).toBeLessThan(0.9);
    await h.close();

    h = await startHarness();
    const again = h.request();
    expect((await again.post("/api/v1/auth/sign-in").send({ email: `restart-${process.pid}@test.example`, password: "a perfectly fine passphrase" })).status).toBe(200);
    const done = await waitReady(again, project, res.body.id);
    expect(done.status).toBe("ready");
    expect(done.progress).toBe(1);
    expect(Math.abs(done.leqDb[13] - 74)).toBeLessThan(0.5);
    expect(done.summary.durationS).toBeCloseTo(60, 1);
  });
});
