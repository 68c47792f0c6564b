import { existsSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { startS3Fake } from "./s3-fake.js";

describe("S3 fake", () => {
  it("keeps an object in a bucket made at start, and removes its own folder on close", async () => {
    const s3 = await startS3Fake({ buckets: ["test-bucket"] });
    const put = await fetch(`${s3.endpoint}/test-bucket/projects/a/files/1`, { method: "PUT", body: "RIFF....WAVE", headers: { "content-type": "audio/wav" } });
    expect(put.status).toBe(200);
    const got = await fetch(`${s3.endpoint}/test-bucket/projects/a/files/1`, { headers: { range: "bytes=4-7" } });
    expect(got.status).toBe(206);
    expect(await got.text()).toBe("....");
    expect((await fetch(`${s3.endpoint}/test-bucket/missing`)).status).toBe(404);
    expect(existsSync(s3.directory)).toBe(true);
    await s3.close();
    expect(existsSync(s3.directory)).toBe(false);
  });
});
