import { useEffect, useRef, useState } from "react";
import { constructionCatalogue, validatePlan, type Plan, type Problem } from "@hushmark/floorplan";

/**
 * The plan's validation problems, worked out in a worker so the main thread keeps drawing; the
 * previous answer stands until the new one arrives. Without workers (tests) it checks inline.
 */
export function useProblems(plan: Plan | null): readonly Problem[] {
  const [problems, setProblems] = useState<readonly Problem[]>([]);
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  useEffect(() => {
    if (typeof Worker === "undefined") return;
    const w = new Worker(new URL("../model/validate-worker.ts", import.meta.url), { type: "module" });
    worker.current = w;
    w.onmessage = (event: MessageEvent<{ seq: number; problems: Problem[] }>) => {
      if (event.data.seq === seq.current) setProblems(event.data.problems);
    };
    return () => { w.terminate(); worker.current = null; };
  }, []);
  useEffect(() => {
    if (!plan) return;
    seq.current++;
    if (worker.current) worker.current.postMessage({ seq: seq.current, plan });
    else if (typeof Worker === "undefined") setProblems(validatePlan(plan, constructionCatalogue));
  }, [plan]);
  return problems;
}
