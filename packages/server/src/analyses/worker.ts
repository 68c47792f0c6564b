// A worker thread of the analysis pool (piscina): one analysis per task, nothing shared.
import type { Construction } from "@hushmark/floorplan";
import { computeAnalysisWith, type AnalysisOutcome, type ParsedAnalysisRequest } from "./compute.js";

export interface AnalysisTask {
  document: unknown;
  request: ParsedAnalysisRequest;
  /** The firm's own constructions, added to the built-in catalogue. */
  constructions: Construction[];
}

export default function analyseTask(task: AnalysisTask): AnalysisOutcome & { computeMs: number } {
  const started = performance.now();
  const outcome = computeAnalysisWith(task.document, task.request, task.constructions);
  return { ...outcome, computeMs: Math.round((performance.now() - started) * 10) / 10 };
}
