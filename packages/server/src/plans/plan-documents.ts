import type { EmptyPlanFactory } from "../projects/projects.service.js";
import type { PlanDocumentCheck } from "./plans.service.js";

/**
 * The document a new project's plan starts with, and the check a saved document must pass.
 * These delegate to the plan model (`@hushmark/floorplan`) once its schema is wired in.
 */
export const emptyPlanDocument: EmptyPlanFactory = () => ({});

export const planDocumentCheck: PlanDocumentCheck = (document) => {
  const size = JSON.stringify(document).length;
  return size > 8_000_000 ? [{ path: "document", message: "The plan is larger than 8 MB; split it into several projects." }] : [];
};
