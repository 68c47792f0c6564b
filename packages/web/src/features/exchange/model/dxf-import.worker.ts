/// <reference lib="webworker" />
import { dxfSurvey, importDxf } from "@hushmark/floorplan";
import type { WorkerReply, WorkerRequest } from "./dxf-runner";

// Reading and converting a large drawing takes seconds; here it never blocks drawing or typing.
const reply = (message: WorkerReply) => (self as unknown as DedicatedWorkerGlobalScope).postMessage(message);

self.onmessage = async (event: MessageEvent<WorkerRequest>) => {
  const request = event.data;
  try {
    const text = await request.file.text();
    if (request.kind === "survey") reply({ id: request.id, kind: "survey", survey: dxfSurvey(text) });
    else reply({ id: request.id, kind: "converted", result: importDxf(text, request.options, (done, total) => reply({ id: request.id, kind: "progress", done, total })) });
  } catch (error) {
    reply({ id: request.id, kind: "failed", message: error instanceof Error ? error.message : String(error) });
  }
};
