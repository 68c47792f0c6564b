import { workerChannel } from "./worker-channel";
import { dxfSurvey, importDxf, type DxfImportOptions, type DxfImportResult, type DxfSurvey } from "@hushmark/floorplan";

/** Reads a DXF file's layers and converts it, reporting progress as entity counts. */
export interface DxfRunner {
  survey(file: Blob): Promise<DxfSurvey>;
  convert(file: Blob, options: DxfImportOptions, onProgress: (done: number, total: number) => void): Promise<DxfImportResult>;
  dispose(): void;
}

export type WorkerRequest =
  | { id: number; kind: "survey"; file: Blob }
  | { id: number; kind: "convert"; file: Blob; options: DxfImportOptions };

export type WorkerReply =
  | { id: number; kind: "survey"; survey: DxfSurvey }
  | { id: number; kind: "progress"; done: number; total: number }
  | { id: number; kind: "converted"; result: DxfImportResult }
  | { id: number; kind: "failed"; message: string };

/** Runs on the calling thread: for tests and browsers without module workers. */
export function inlineDxfRunner(): DxfRunner {
  return {
    survey: async (file) => dxfSurvey(await file.text()),
    convert: async (file, options, onProgress) => importDxf(await file.text(), options, onProgress),
    dispose: () => {},
  };
}

/** Runs in a module worker, so a drawing of tens of MB converts without freezing the page. */
export function workerDxfRunner(): DxfRunner {
  const channel = workerChannel<WorkerRequest, WorkerReply>(new Worker(new URL("./dxf-import.worker.ts", import.meta.url), { type: "module" }), "The DXF reader could not start.");
  return {
    async survey(file) {
      const reply = await channel.ask({ kind: "survey", file });
      if (reply.kind === "survey") return reply.survey;
      throw new Error(reply.kind === "failed" ? reply.message : "The drawing could not be read.");
    },
    async convert(file, options, onProgress) {
      const reply = await channel.ask({ kind: "convert", file, options }, onProgress);
      if (reply.kind === "converted") return reply.result;
      throw new Error(reply.kind === "failed" ? reply.message : "The drawing could not be converted.");
    },
    dispose: channel.dispose,
  };
}

/** A worker runner where module workers exist, otherwise the inline one. */
export function defaultDxfRunner(): DxfRunner {
  return typeof Worker === "undefined" ? inlineDxfRunner() : workerDxfRunner();
}
