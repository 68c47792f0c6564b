import type { IfcAPI } from "web-ifc";
import { workerChannel } from "./worker-channel";
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
  const channel = workerChannel<IfcWorkerRequest, IfcWorkerReply>(new Worker(new URL("./ifc-import.worker.ts", import.meta.url), { type: "module" }), "The IFC reader could not start.");
  return {
    async read(file, onProgress) {
      const reply = await channel.ask({ kind: "read", file }, onProgress);
      if (reply.kind === "read") return reply.reply;
      throw new Error(reply.kind === "failed" ? reply.message : "The model could not be read.");
    },
    async convert(options) {
      const reply = await channel.ask({ kind: "convert", options });
      if (reply.kind === "converted") return reply.imported;
      throw new Error(reply.kind === "failed" ? reply.message : "The model could not be converted.");
    },
    dispose: channel.dispose,
  };
}
