// Loaded only when someone opens a PDF as an underlay (dynamic import), so pdf.js stays out of the main bundle.
import { getDocument, GlobalWorkerOptions } from "pdfjs-dist";
// Vite copies the worker into the build as an asset and gives its URL; nothing is fetched from elsewhere.
import workerSrc from "pdfjs-dist/build/pdf.worker.min.mjs?url";

GlobalWorkerOptions.workerSrc = workerSrc;

/** About 200 dots per inch: small print on a plan stays readable when zoomed in to trace. */
const TARGET_DPI = 200;
const MAX_SIDE_PX = 6000;
const MAX_PIXELS = 36_000_000;

export interface OpenedPdf {
  pageCount: number;
  /** Renders one page (counted from 1) to a PNG on a white ground. */
  renderPage: (page: number) => Promise<{ blob: Blob; widthPx: number; heightPx: number }>;
  close: () => void;
}

/** Opens a PDF in the browser; throws a readable Error when it cannot be read. */
export async function openPdf(data: ArrayBuffer): Promise<OpenedPdf> {
  let doc;
  try {
    doc = await getDocument({ data, isEvalSupported: false, useSystemFonts: true, stopAtErrors: true }).promise;
  } catch (error) {
    const name = (error as { name?: string }).name;
    if (name === "PasswordException") throw new Error("This PDF is protected by a password. Save an unprotected copy and open that. Nothing was added.");
    throw new Error("This PDF could not be read; it may be damaged or cut short. Nothing was added.");
  }
  return {
    pageCount: doc.numPages,
    close: () => void doc.destroy(),
    async renderPage(n) {
      if (!Number.isInteger(n) || n < 1 || n > doc.numPages) throw new Error(`Choose a page from 1 to ${doc.numPages}.`);
      try {
        const page = await doc.getPage(n);
        const unit = page.getViewport({ scale: 1 }); // PDF points, 1/72 inch
        let scale = TARGET_DPI / 72;
        scale = Math.min(scale, MAX_SIDE_PX / Math.max(unit.width, unit.height), Math.sqrt(MAX_PIXELS / (unit.width * unit.height)));
        const viewport = page.getViewport({ scale });
        const canvas = document.createElement("canvas");
        canvas.width = Math.floor(viewport.width);
        canvas.height = Math.floor(viewport.height);
        const ctx = canvas.getContext("2d");
        if (!ctx) throw new Error("no canvas");
        // PDF pages are transparent where nothing is printed; tracing needs paper behind them.
        ctx.fillStyle = "#ffffff";
        ctx.fillRect(0, 0, canvas.width, canvas.height);
        await page.render({ canvas, canvasContext: ctx, viewport }).promise;
        const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
        page.cleanup();
        if (!blob) throw new Error("no image");
        return { blob, widthPx: canvas.width, heightPx: canvas.height };
      } catch {
        throw new Error(`Page ${n} of this PDF could not be drawn; it may be damaged. Nothing was added.`);
      }
    },
  };
}
