/// <reference lib="webworker" />
import { ifcReader } from "@hushmark/floorplan/ifc";
// Served by Vite as a hashed asset from our own origin: the reader is never fetched from elsewhere.
import wasmUrl from "web-ifc/web-ifc.wasm?url";
import { ifcSteps, type IfcWorkerReply, type IfcWorkerRequest } from "./ifc-runner";

const reply = (message: IfcWorkerReply) => (self as unknown as DedicatedWorkerGlobalScope).postMessage(message);
let api: ReturnType<typeof ifcReader> | null = null;
// A reader that failed to start is dropped, so the next file tries again.
const steps = ifcSteps(() => (api ??= ifcReader(() => new URL(wasmUrl, self.location.href).href).catch((e: unknown) => { api = null; throw e; })));

self.onmessage = async (event: MessageEvent<IfcWorkerRequest>) => {
  const request = event.data;
  try {
    if (request.kind === "read") {
      const bytes = new Uint8Array(await request.file.arrayBuffer());
      reply({ id: request.id, kind: "read", reply: await steps.read(bytes, (done, total) => reply({ id: request.id, kind: "progress", done, total })) });
    } else {
      reply({ id: request.id, kind: "converted", imported: steps.convert(request.options) });
    }
  } catch (error) {
    reply({ id: request.id, kind: "failed", message: error instanceof Error ? error.message : String(error) });
  }
};
