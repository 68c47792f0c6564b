/// <reference path="./s3rver.d.ts" />
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import S3rver from "s3rver";

export interface S3FakeOptions {
  host?: string;
  /** 0 picks a free port. */
  port?: number;
  /** Where objects are kept; a fresh temporary folder (removed on close) when not given. */
  directory?: string;
  /** Buckets that exist from the start. */
  buckets?: string[];
}

export interface S3Fake {
  port: number;
  endpoint: string;
  directory: string;
  close(): Promise<void>;
}

/** An S3-compatible object store on loopback (path-style addressing, any credentials). */
export async function startS3Fake(options: S3FakeOptions = {}): Promise<S3Fake> {
  const owned = !options.directory;
  const directory = options.directory ?? mkdtempSync(join(tmpdir(), "hushmark-s3-"));
  const server = new S3rver({
    address: options.host ?? "127.0.0.1",
    port: options.port ?? 0,
    silent: true,
    directory,
    configureBuckets: (options.buckets ?? []).map((name) => ({ name })),
  });
  const { port } = await server.run();
  return {
    port,
    endpoint: `http://${options.host ?? "127.0.0.1"}:${port}`,
    directory,
    close: async () => {
      await server.close();
      if (owned) rmSync(directory, { recursive: true, force: true });
    },
  };
}
