import { createHash, randomUUID } from "node:crypto";
import { createReadStream } from "node:fs";
import { mkdir, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Request, Response } from "express";
import { fileTypeFromFile } from "file-type";
import multer from "multer";
import { HttpError } from "../http/errors.js";

export interface ReceivedUpload {
  /** Temporary file on local disk, under a random name; removed by `discard`. */
  path: string;
  sizeBytes: number;
  sha256: string;
  /** Found by reading the content. */
  contentType: string;
  originalName: string;
  fields: Record<string, string>;
  discard(): Promise<void>;
}

export interface UploadRules {
  maxBytes: number;
  /** Content types (as found in the content) that are accepted. */
  accept: readonly string[];
  /** What the file should be, for messages: "a WAV recording", "a photo (JPEG, PNG or WebP)". */
  what: string;
}

const UPLOAD_DIR = join(tmpdir(), "hushmark-uploads");
// Room for the multipart framing and the text fields around the file.
const FRAMING_BYTES = 256 * 1024;

const megabytes = (bytes: number) => `${Math.round(bytes / (1024 * 1024))} MB`;

export const tooLarge = (rules: UploadRules) =>
  new HttpError(413, "too_large", `The file is larger than the ${megabytes(rules.maxBytes)} limit for ${rules.what}. Nothing was saved.`);

/**
 * Receives one multipart file (field `file`) into a temporary file: refuses an announced size over
 * the limit before reading the body, stops reading when the limit is passed, and checks the type
 * by the content, never by the name or the browser's claim. The uploaded name is kept for display
 * only and never touches a path.
 */
export async function receiveUpload(req: Request, res: Response, rules: UploadRules): Promise<ReceivedUpload> {
  const announced = Number(req.get("content-length") ?? "NaN");
  if (Number.isFinite(announced) && announced > rules.maxBytes + FRAMING_BYTES) {
    res.set("connection", "close");
    throw tooLarge(rules);
  }
  if (!req.is("multipart/form-data")) {
    throw new HttpError(400, "invalid_input", "Some fields need attention.", [{ path: "file", message: `Send ${rules.what} as multipart/form-data in a field named “file”.` }]);
  }
  await mkdir(UPLOAD_DIR, { recursive: true });
  const middleware = multer({
    storage: multer.diskStorage({ destination: UPLOAD_DIR, filename: (_req, _file, cb) => cb(null, randomUUID()) }),
    limits: { fileSize: rules.maxBytes, files: 1, fields: 30, fieldSize: 16 * 1024 },
  }).single("file");
  try {
    await new Promise<void>((resolve, reject) => middleware(req, res, (error?: unknown) => (error ? reject(error) : resolve())));
  } catch (error) {
    if (req.file?.path) await rm(req.file.path, { force: true });
    if (error instanceof multer.MulterError) {
      if (error.code === "LIMIT_FILE_SIZE") {
        res.set("connection", "close");
        throw tooLarge(rules);
      }
      throw new HttpError(400, "invalid_input", "Some fields need attention.", [{ path: error.field ?? "file", message: `The upload could not be read (${error.message}). Send one file in a field named “file”.` }]);
    }
    throw new HttpError(400, "upload_interrupted", "The upload stopped before the whole file arrived. Nothing was saved; please try again.");
  }
  const file = req.file;
  if (!file) throw new HttpError(400, "invalid_input", "Some fields need attention.", [{ path: "file", message: `Choose ${rules.what} to upload.` }]);
  const discard = () => rm(file.path, { force: true });
  try {
    const sizeBytes = (await stat(file.path)).size;
    if (sizeBytes === 0) throw new HttpError(400, "invalid_input", "Some fields need attention.", [{ path: "file", message: "The file is empty." }]);
    const found = await fileTypeFromFile(file.path);
    if (!found || !rules.accept.includes(found.mime)) {
      const seen = found ? `its content is ${found.ext.toUpperCase()} (${found.mime})` : "its content is not a format we recognise";
      throw new HttpError(415, "unsupported_media_type", `This file is not ${rules.what}: ${seen}, whatever its name says. Nothing was saved.`);
    }
    const sha256 = await hashFile(file.path);
    const fields = Object.fromEntries(Object.entries(req.body ?? {}).map(([k, v]) => [k, String(v)]));
    return { path: file.path, sizeBytes, sha256, contentType: found.mime, originalName: file.originalname.slice(0, 200), fields, discard };
  } catch (error) {
    await discard();
    throw error;
  }
}

async function hashFile(path: string): Promise<string> {
  const hash = createHash("sha256");
  for await (const chunk of createReadStream(path)) hash.update(chunk as Buffer);
  return hash.digest("hex");
}
