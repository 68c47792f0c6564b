import { useEffect, useRef, useState } from "react";
import { constructionCatalogue, validatePlan, type Plan, type Problem } from "@hushmark/floorplan";

/** Runs `fn` when the browser has a moment, or after `timeoutMs` at the latest. */
function whenIdle(fn: () => void, timeoutMs: number): () => void {
  if (typeof window.requestIdleCallback === "function") {
    const id = window.requestIdleCallback(fn, { timeout: timeoutMs });
    return () => window.cancelIdleCallback(id);
  }
  const id = window.setTimeout(fn, Math.min(timeoutMs, 100));
  return () => window.clearTimeout(id);
}

/**
 * The plan's validation problems, worked out in a worker so the main thread keeps drawing; the
 * previous answer stands until the new one arrives. Without workers (tests) it checks inline.
 * The worker starts, and the first plan is sent, only once the opened plan is on screen: copying
 * a large plan to the worker and loading its code would otherwise delay the first drawing.
 */
export function useProblems(plan: Plan | null): readonly Problem[] {
  const [problems, setProblems] = useState<readonly Problem[]>([]);
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  const started = useRef(false);
  useEffect(() => () => { worker.current?.terminate(); worker.current = null; }, []);
  useEffect(() => {
    if (!plan) return;
    const n = ++seq.current;
    if (typeof Worker === "undefined") {
      setProblems(validatePlan(plan, constructionCatalogue));
      return;
    }
    const send = () => {
      started.current = true;
      if (!worker.current) {
        const w = new Worker(new URL("../model/validate-worker.ts", import.meta.url), { type: "module" });
        w.onmessage = (event: MessageEvent<{ seq: number; problems: Problem[] }>) => {
          if (event.data.seq === seq.current) setProblems(event.data.problems);
        };
        worker.current = w;
      }
      worker.current.postMessage({ seq: n, plan });
    };
    if (started.current) { send(); return; }
    return whenIdle(send, 400);
  }, [plan]);
  return problems;
}
