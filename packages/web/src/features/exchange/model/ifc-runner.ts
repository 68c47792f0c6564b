import type { IfcAPI } from "web-ifc";
import { convertIfc, ifcSurvey, readIfc, type IfcImport, type IfcImportOptions, type IfcModelRead, type IfcProblem, type IfcSurvey } from "@hushmark/floorplan/ifc";

export type IfcReadReply = { ok: true; survey: IfcSurvey } | { ok: false; problem: IfcProblem };

/** Reads an IFC model (keeping it for the next step) and converts it with the surveyor's choices. */
export interface IfcRunner {
  read(file: Blob, onProgress: (done: number, total: number) => void): Promise<IfcReadReply>;
  convert(options: IfcImportOptions): Promise<IfcImport>;
  dispose(): void;
}

export type IfcWorkerRequest =
  | { id: number; kind: "read"; file: Blob }
  | { id: number; kind: "convert"; options: IfcImportOptions };

export type IfcWorkerReply =
  | { id: number; kind: "read"; reply: IfcReadReply }
  | { id: number; kind: "progress"; done: number; total: number }
  | { id: number; kind: "converted"; imported: IfcImport }
  | { id: number; kind: "failed"; message: string };

/** The read-then-convert steps over one reader; the worker and the inline runner share it. */
export function ifcSteps(reader: () => Promise<IfcAPI>) {
  let model: IfcModelRead | null = null;
  return {
    async read(bytes: Uint8Array, onProgress: (done: number, total: number) => void): Promise<IfcReadReply> {
      const result = readIfc(await reader(), bytes, onProgress);
      model = result.ok ? result.model : null;
      return result.ok ? { ok: true, survey: ifcSurvey(result.model) } : result;
    },
    convert(options: IfcImportOptions): IfcImport {
      if (!model) throw new Error("Choose an IFC file first.");
      return convertIfc(model, options);
    },
  };
}

/** Runs on the calling thread: for tests. */
export function inlineIfcRunner(reader: () => Promise<IfcAPI>): IfcRunner {
  const steps = ifcSteps(reader);
  return {
    read: async (file, onProgress) => steps.read(new Uint8Array(await file.arrayBuffer()), onProgress),
    convert: async (options) => steps.convert(options),
    dispose: () => {},
  };
}

/** Runs in a module worker with the bundled WebAssembly reader, so a model of tens of MB never freezes the page. */
export function workerIfcRunner(): IfcRunner {
  const worker = new Worker(new URL("./ifc-import.worker.ts", import.meta.url), { type: "module" });
  let seq = 0;
  const waiting = new Map<number, { resolve: (r: IfcWorkerReply) => void; onProgress?: (done: number, total: number) => void }>();
  worker.onmessage = (event: MessageEvent<IfcWorkerReply>) => {
    const reply = event.data;
    const w = waiting.get(reply.id);
    if (!w) return;
    if (reply.kind === "progress") w.onProgress?.(reply.done, reply.total);
    else {
      waiting.delete(reply.id);
      w.resolve(reply);
    }
  };
  worker.onerror = (event) => {
    for (const [id, w] of waiting) w.resolve({ id, kind: "failed", message: event.message || "The IFC reader could not start." });
    waiting.clear();
  };
  const ask = (request: IfcWorkerRequest, onProgress?: (done: number, total: number) => void) =>
    new Promise<IfcWorkerReply>((resolve) => {
      waiting.set(request.id, { resolve, ...(onProgress ? { onProgress } : {}) });
      worker.postMessage(request);
    });
  return {
    async read(file, onProgress) {
      const reply = await ask({ id: ++seq, kind: "read", file }, onProgress);
      if (reply.kind === "read") return reply.reply;
      throw new Error(reply.kind === "failed" ? reply.message : "The model could not be read.");
    },
    async convert(options) {
      const reply = await ask({ id: ++seq, kind: "convert", options });
      if (reply.kind === "converted") return reply.imported;
      throw new Error(reply.kind === "failed" ? reply.message : "The model could not be converted.");
    },
    dispose: () => worker.terminate(),
  };
}
