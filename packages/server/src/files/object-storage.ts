import { Readable } from "node:stream";
import { CreateBucketCommand, DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import type { AppConfig } from "../config.js";
import { HttpError } from "../http/errors.js";

/** Where uploaded files live: S3 or any S3-compatible store (the local fake in development and tests). */
export interface ObjectStorage {
  put(key: string, body: Readable | Buffer, sizeBytes: number, contentType: string): Promise<void>;
  /** The object's bytes, or the inclusive byte range [start, end]. */
  get(key: string, range?: { start: number; end: number }): Promise<Readable>;
  delete(key: string): Promise<void>;
  close(): void;
}

export const storageUnavailable = () =>
  new HttpError(503, "storage_unavailable", "File storage is not reachable just now; nothing was saved. Please try again in a minute.");

export function createObjectStorage(config: AppConfig["s3"]): ObjectStorage {
  const client = new S3Client({
    region: config.region,
    forcePathStyle: config.forcePathStyle,
    // Streamed bodies otherwise go out as aws-chunked with trailing checksums, which S3-compatible
    // stores (the local fake among them) may keep verbatim; integrity is our own sha256.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    ...(config.endpoint ? { endpoint: config.endpoint } : {}),
    ...(config.accessKeyId && config.secretAccessKey ? { credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey } } : {}),
  });
  const bucket = config.bucket;
  let bucketReady: Promise<void> | null = null;

  // Created on first use so a fresh local store works without a set-up step; production buckets already exist.
  const ensureBucket = () => {
    bucketReady ??= client.send(new HeadBucketCommand({ Bucket: bucket })).then(
      () => undefined,
      async () => {
        await client.send(new CreateBucketCommand({ Bucket: bucket }));
      },
    );
    bucketReady.catch(() => (bucketReady = null));
    return bucketReady;
  };

  return {
    async put(key, body, sizeBytes, contentType) {
      await ensureBucket();
      await client.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentLength: sizeBytes, ContentType: contentType }));
    },
    async get(key, range) {
      const res = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key, ...(range ? { Range: `bytes=${range.start}-${range.end}` } : {}) }));
      if (!(res.Body instanceof Readable)) throw new Error("object storage answered no stream");
      return res.Body;
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
    },
    close() {
      client.destroy();
    },
  };
}
