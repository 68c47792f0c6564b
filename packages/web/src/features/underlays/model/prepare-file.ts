/** What a chosen file turned out to be, read from its first bytes (never from its name). */
export type FileKind = "png" | "jpeg" | "webp" | "pdf" | "heic" | "unknown";

const HEIC_BRANDS = new Set(["heic", "heix", "hevc", "hevx", "heim", "heis", "mif1", "msf1"]);

export function fileKindOf(head: Uint8Array): FileKind {
  const ascii = (from: number, to: number) => String.fromCharCode(...head.subarray(from, to));
  if (head[0] === 0x89 && ascii(1, 4) === "PNG") return "png";
  if (head[0] === 0xff && head[1] === 0xd8 && head[2] === 0xff) return "jpeg";
  if (ascii(0, 4) === "RIFF" && ascii(8, 12) === "WEBP") return "webp";
  if (ascii(0, 5) === "%PDF-") return "pdf";
  if (ascii(4, 8) === "ftyp" && HEIC_BRANDS.has(ascii(8, 12))) return "heic";
  return "unknown";
}

export const UNDERLAY_ACCEPT = "image/png,image/jpeg,image/webp,image/heic,image/heif,.heic,.heif,application/pdf,.pdf";

/** An image ready to upload: what the server accepts (PNG, JPEG or WebP) and its size in pixels. */
export interface PreparedImage {
  blob: Blob;
  fileName: string;
  name: string;
  source: "image" | "pdf-page";
  page?: number;
  widthPx: number;
  heightPx: number;
}

const baseName = (fileName: string) => fileName.replace(/\.[A-Za-z0-9]{1,5}$/, "").slice(0, 200);

/** Decodes the image once to learn its size; a damaged file fails here, before anything is sent. */
export async function imageSize(blob: Blob): Promise<{ widthPx: number; heightPx: number }> {
  try {
    const bitmap = await createImageBitmap(blob);
    const size = { widthPx: bitmap.width, heightPx: bitmap.height };
    bitmap.close();
    if (!size.widthPx || !size.heightPx) throw new Error("empty");
    return size;
  } catch {
    throw new Error("This image could not be read; it may be damaged or cut short. Nothing was added.");
  }
}

/** A PNG, JPEG or WebP as it is; a HEIC photo converted to JPEG here in the browser. PDFs go through `openPdf`. */
export async function prepareImage(file: File, kind: FileKind): Promise<PreparedImage> {
  const name = baseName(file.name);
  if (kind === "png" || kind === "jpeg" || kind === "webp") {
    return { blob: file, fileName: file.name, name, source: "image", ...(await imageSize(file)) };
  }
  if (kind === "heic") {
    let jpeg: Blob;
    try {
      // heic2any is large; it loads only when a HEIC photo is chosen.
      const { default: heic2any } = await import("heic2any");
      const out = await heic2any({ blob: file, toType: "image/jpeg", quality: 0.9 });
      jpeg = Array.isArray(out) ? out[0]! : out;
    } catch {
      throw new Error("This HEIC photo could not be converted; it may be damaged. Export it from the phone as JPEG and try again. Nothing was added.");
    }
    return { blob: jpeg, fileName: `${name || "photo"}.jpg`, name, source: "image", ...(await imageSize(jpeg)) };
  }
  throw new Error("Choose a drawing to trace: a PNG, JPEG, WebP or HEIC image, or a PDF. This file is none of those, whatever its name says. Nothing was added.");
}

export async function fileKind(file: Blob): Promise<FileKind> {
  return fileKindOf(new Uint8Array(await file.slice(0, 16).arrayBuffer()));
}

export { baseName };
