// A worker thread of the analysis pool (piscina): one analysis per task, nothing shared.
import { computeAnalysis, type AnalysisOutcome, type ParsedAnalysisRequest } from "./compute.js";

export default function analyse(task: { document: unknown; request: ParsedAnalysisRequest }): AnalysisOutcome & { computeMs: number } {
  const started = performance.now();
  const outcome = computeAnalysis(task.document, task.request);
  return { ...outcome, computeMs: Math.round((performance.now() - started) * 10) / 10 };
}
