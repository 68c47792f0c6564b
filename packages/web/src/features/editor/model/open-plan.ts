import { parsePlan, type Plan } from "@hushmark/floorplan";
import { newPlan } from "@hushmark/editor-core";

/** The plan to edit from the stored document: a new blank plan when nothing is drawn yet. */
export function openPlan(document: Record<string, unknown>, projectId: string, title: string): { plan: Plan; problem: string | null } {
  if (Object.keys(document).length === 0) return { plan: newPlan(`plan-${projectId.slice(0, 8)}`, title), problem: null };
  const parsed = parsePlan(document);
  if (parsed.ok) return { plan: parsed.plan, problem: null };
  return { plan: newPlan(`plan-${projectId.slice(0, 8)}`, title), problem: parsed.problems.map((p) => p.message).slice(0, 3).join("; ") };
}
