/// <reference lib="webworker" />
import { constructionCatalogue, validatePlan, type Plan } from "@hushmark/floorplan";

// Checks plans off the main thread: a large plan takes a quarter of a second to check, which
// would otherwise stall drawing and typing after every edit.
self.onmessage = (event: MessageEvent<{ seq: number; plan: Plan }>) => {
  const { seq, plan } = event.data;
  try {
    self.postMessage({ seq, problems: validatePlan(plan, constructionCatalogue) });
  } catch (error) {
    self.postMessage({ seq, problems: [], error: error instanceof Error ? error.message : String(error) });
  }
};
