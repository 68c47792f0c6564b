import { parseNetwork, solveNetwork, type SolveResult, type Target as EngineTarget } from "@hushmark/acoustics";
import { buildNetwork } from "../builder/build-network.js";
import type { BuildResult } from "../builder/types.js";
import { sourceSpectrum } from "../catalogue/sources.js";
import type { Catalogue } from "../catalogue/types.js";
import type { Plan, Target } from "../document/schema.js";
import { mapResultToPlan } from "../result/map-result.js";
import { exactPartGainsDb } from "./exact-gains.js";
import type { PlanResult } from "../result/types.js";
import type { Problem } from "../validation/problem.js";

/** What to analyse: a source (a space with a library or given spectrum, or impact on a room's floor) and a receiving room. */
export interface SolvePlanRequest {
  source: { spaceId: string; spectrumId: string } | { spaceId: string; levelsDb: number[] } | { impactOnRoomId: string; lnOffsetDb?: number };
  receiver: string;
  /** Paths to rank (default 10). */
  k?: number;
  /** Defaults to the receiving room's own target, if it has one. */
  target?: Target;
  flanking?: boolean;
  /** How many of the strongest door/window/gap/wall-part elements get an exact gain-if-perfect by re-solving (default 5). */
  exactPartGains?: number;
}

export type SolvePlanResult =
  | { ok: true; result: SolveResult; onPlan: PlanResult; assumptions: Problem[]; built: Extract<BuildResult, { ok: true }> }
  | { ok: false; problems: Problem[] };

/** The engine's form of a room target (dB(A) level, NC clamped to the rated NC-15…70, or reduction in dB). */
function toEngineTarget(target: Target): EngineTarget {
  if (target.kind === "dba") return { kind: "level", dba: target.dba };
  if (target.kind === "nc") return { kind: "nc", nc: Math.min(70, Math.max(15, target.nc)) };
  return { kind: "reduction", db: target.reductionDb };
}

function requestProblem(elementId: string, message: string, suggestion: string): Problem {
  return { code: "analysis-request", severity: "error", elementId, message, suggestion };
}

/** Builds, solves and maps back one analysis of a plan, with exact gains for the strongest wall parts (levels in dB, shares 0–1, gains in dB(A)). */
export function solvePlan(plan: Plan, catalogue: Catalogue, request: SolvePlanRequest): SolvePlanResult {
  const rx = plan.elements[request.receiver];
  if (!rx || (rx.type !== "room" && rx.type !== "void" && rx.type !== "neighbour")) {
    return { ok: false, problems: [requestProblem(request.receiver, `There is no room called “${request.receiver}” to listen in.`, "Pick the receiving room on the plan.")] };
  }
  const s = request.source;
  let sources: NonNullable<Parameters<typeof buildNetwork>[2]>["sources"];
  if ("impactOnRoomId" in s) {
    sources = [{ type: "impact", roomId: s.impactOnRoomId, ...(s.lnOffsetDb !== undefined ? { lnOffsetDb: s.lnOffsetDb } : {}) }];
  } else {
    const levelsDb = "levelsDb" in s ? s.levelsDb : sourceSpectrum(s.spectrumId)?.levelsDb;
    if (!levelsDb) return { ok: false, problems: [requestProblem("", `“${"spectrumId" in s ? s.spectrumId : ""}” is not in the source library.`, "Pick a library spectrum, a measurement or enter one.")] };
    sources = [{ type: "airborne", spaceId: s.spaceId, levelsDb }];
  }
  const built = buildNetwork(plan, catalogue, { sources, ...(request.flanking !== undefined ? { flanking: request.flanking } : {}) });
  if (!built.ok) return built;
  if ((built.network.sources ?? []).length === 0) {
    return { ok: false, problems: [requestProblem("impactOnRoomId" in s ? s.impactOnRoomId : s.spaceId, "The source is not a space of this plan, or there is no floor under that room to strike.", "Pick a room, void or the outdoors as the source.")] };
  }
  const parsed = parseNetwork(built.network);
  if (!parsed.ok) throw new Error(`builder produced an invalid network: ${parsed.issues.slice(0, 3).map((i) => `${i.path} ${i.message}`).join("; ")}`);
  const target = request.target ?? (rx.type === "room" ? rx.target : undefined);
  const result = solveNetwork(parsed.value, { receiver: request.receiver, k: request.k ?? 10, ...(target ? { target: toEngineTarget(target) } : {}) });
  const onPlan = mapResultToPlan(plan, built, result);
  const estimated = onPlan.elements.filter((e) => !e.gainExact && e.kind !== "flanking" && e.share > 0).slice(0, request.exactPartGains ?? 5);
  const exact = exactPartGainsDb(parsed.value, { receiver: request.receiver }, estimated.map((e) => ({ elementId: e.elementId, linkId: e.linkIds[0]! })));
  for (const e of onPlan.elements) {
    const g = exact.get(e.elementId);
    if (g !== undefined && Number.isFinite(g)) {
      e.gainIfPerfectDb = g;
      e.gainExact = true;
    }
  }
  return { ok: true, result, onPlan, assumptions: built.assumptions, built };
}
