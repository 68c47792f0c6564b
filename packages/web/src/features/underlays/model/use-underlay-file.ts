import { useRef, useState } from "react";
import type { OpenedPdf } from "./pdf-pages";
import { baseName, fileKind, prepareImage, type PreparedImage } from "./prepare-file";

/**
 * Turns a chosen file into an image to upload: images as they are, HEIC converted, a PDF opened
 * so a page can be picked and rendered. Every failure is a message and nothing is uploaded.
 */
export function useUnderlayFilePicker(onReady: (image: PreparedImage) => Promise<void>) {
  const [stage, setStage] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [pdf, setPdf] = useState<OpenedPdf | null>(null);
  const [page, setPage] = useState(1);
  const pdfName = useRef("");

  const reset = () => {
    pdf?.close();
    setPdf(null);
    setStage(null);
  };

  const finish = async (image: PreparedImage) => {
    setStage("Uploading…");
    try {
      await onReady(image);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setStage(null);
    }
  };

  const renderPage = async (doc: OpenedPdf, n: number) => {
    setStage(`Drawing page ${n}…`);
    try {
      const out = await doc.renderPage(n);
      doc.close();
      setPdf(null);
      await finish({ blob: out.blob, fileName: `${pdfName.current || "page"}-p${n}.png`, name: pdfName.current, source: "pdf-page", page: n, widthPx: out.widthPx, heightPx: out.heightPx });
    } catch (e) {
      setError((e as Error).message);
      setStage(null);
    }
  };

  async function choose(file: File) {
    setError(null);
    reset();
    const kind = await fileKind(file);
    if (kind === "pdf") {
      setStage("Reading the PDF…");
      try {
        // pdf.js loads only when a PDF is chosen.
        const { openPdf } = await import("./pdf-pages");
        const doc = await openPdf(await file.arrayBuffer());
        pdfName.current = baseName(file.name);
        if (doc.pageCount === 1) return await renderPage(doc, 1);
        setPage(1);
        setPdf(doc);
        setStage(null);
      } catch (e) {
        setError((e as Error).message);
        setStage(null);
      }
      return;
    }
    setStage(kind === "heic" ? "Converting the photo…" : "Reading the image…");
    try {
      const image = await prepareImage(file, kind);
      await finish(image);
    } catch (e) {
      setError((e as Error).message);
      setStage(null);
    }
  }

  return {
    choose, reset, pdf, page, setPage, stage, error,
    busy: stage !== null,
    renderChosenPage: async () => { if (pdf) await renderPage(pdf, page); },
  };
}
