import { compileNetwork, solveCompiled, type SolveResult, type Target as EngineTarget } from "@hushmark/acoustics";
import { buildNetwork } from "../builder/build-network.js";
import { linkTauSM2 } from "../builder/transmitting-area.js";
import type { BuildResult } from "../builder/types.js";
import { sourceSpectrum } from "../catalogue/sources.js";
import type { Catalogue } from "../catalogue/types.js";
import type { Plan, Target } from "../document/schema.js";
import { mapResultToPlan } from "../result/map-result.js";
import { exactPartGainsDb } from "./exact-gains.js";
import type { PlanResult } from "../result/types.js";
import type { Problem } from "../validation/problem.js";

/** Code of the problems that are about the request (a space or spectrum that is not there), not the plan. */
export const ANALYSIS_REQUEST_PROBLEM = "analysis-request";

/** The source of an analysis: a space with a library or given spectrum, or impact on a room's floor. */
export type AnalysisSource = { spaceId: string; spectrumId: string } | { spaceId: string; levelsDb: number[] } | { impactOnRoomId: string; lnOffsetDb?: number };

/** What to analyse: a source and a receiving room. */
export interface SolvePlanRequest {
  source: AnalysisSource;
  receiver: string;
  /** Paths to rank (default 10). */
  k?: number;
  /** Defaults to the receiving room's own target, if it has one; `null` analyses without a target. */
  target?: Target | null;
  flanking?: boolean;
  /** How many links (largest shares) get the engine's exact gain-if-perfect (default 20). */
  gains?: number;
  /** How many of the strongest door/window/gap/wall-part elements get an exact gain-if-perfect by re-solving (default 5). */
  exactPartGains?: number;
}

type Built = Extract<BuildResult, { ok: true }>;

export type SolvePlanResult =
  | { ok: true; result: SolveResult; onPlan: PlanResult; assumptions: Problem[]; built: Built; sourceId: string }
  | { ok: false; problems: Problem[] };

/** A plan built into the engine's network for one source and receiver, or why it cannot be. */
export type PreparedPlanNetwork = { ok: true; built: Built; sourceId: string } | { ok: false; problems: Problem[] };

/** The engine's form of a room target (dB(A) level, NC clamped to the rated NC-15…70, or reduction in dB). */
export function engineTargetOf(target: Target): EngineTarget {
  if (target.kind === "dba") return { kind: "level", dba: target.dba };
  if (target.kind === "nc") return { kind: "nc", nc: Math.min(70, Math.max(15, target.nc)) };
  return { kind: "reduction", db: target.reductionDb };
}

function requestProblem(elementId: string, message: string, suggestion: string): Problem {
  return { code: ANALYSIS_REQUEST_PROBLEM, severity: "error", elementId, message, suggestion };
}

const notASpace = (id: string, what: string) => requestProblem(id, `“${id}” is not a room or space of this plan.`, `Pick the ${what} on the plan.`);

/**
 * Checks the request against the plan and builds the network with the request's source: the
 * one path every analysis takes (the API, the command line and upgrade scenarios). Request
 * problems carry the code `analysis-request`; a plan that cannot be analysed gives its own.
 */
export function preparePlanNetwork(plan: Plan, catalogue: Catalogue, request: Pick<SolvePlanRequest, "source" | "receiver" | "flanking">): PreparedPlanNetwork {
  const rx = plan.elements[request.receiver];
  if (!rx || (rx.type !== "room" && rx.type !== "void" && rx.type !== "neighbour")) return { ok: false, problems: [notASpace(request.receiver, "receiving room")] };
  const s = request.source;
  const sourceId = "impactOnRoomId" in s ? s.impactOnRoomId : s.spaceId;
  let sources: NonNullable<Parameters<typeof buildNetwork>[2]>["sources"];
  if ("impactOnRoomId" in s) {
    if (plan.elements[s.impactOnRoomId]?.type !== "room") return { ok: false, problems: [notASpace(s.impactOnRoomId, "room whose floor is struck")] };
    sources = [{ type: "impact", roomId: s.impactOnRoomId, ...(s.lnOffsetDb !== undefined ? { lnOffsetDb: s.lnOffsetDb } : {}) }];
  } else {
    const levelsDb = "levelsDb" in s ? s.levelsDb : sourceSpectrum(s.spectrumId)?.levelsDb;
    if (!levelsDb) return { ok: false, problems: [requestProblem("", `There is no source spectrum “${"spectrumId" in s ? s.spectrumId : ""}” in the library.`, "Pick a library spectrum, a measurement or enter one.")] };
    sources = [{ type: "airborne", spaceId: s.spaceId, levelsDb: [...levelsDb] }];
  }
  if (sourceId === request.receiver) return { ok: false, problems: [requestProblem(sourceId, "The source and the receiver are the same space; pick two different ones.", "Pick another receiving room.")] };
  const built = buildNetwork(plan, catalogue, { sources, ...(request.flanking !== undefined ? { flanking: request.flanking } : {}) });
  if (!built.ok) return built;
  const spaceIds = new Set(built.network.spaces.map((sp) => sp.id));
  if (!spaceIds.has(request.receiver)) return { ok: false, problems: [notASpace(request.receiver, "receiving room")] };
  if (!("impactOnRoomId" in s) && !spaceIds.has(s.spaceId)) return { ok: false, problems: [notASpace(s.spaceId, "source room, void or the outdoors")] };
  if (built.network.sources.length === 0) {
    return { ok: false, problems: [requestProblem(sourceId, "There is no floor under that room to strike.", "Pick a room with a room below it as the impact source.")] };
  }
  return { ok: true, built, sourceId };
}

/**
 * Builds, solves and maps back one analysis of a plan, with exact gains for the strongest wall
 * parts (levels in dB, shares 0–1, gains in dB(A)). The builder's network already has the
 * engine's parsed shape and its links' τS, so it is compiled without a second schema pass.
 */
export function solvePlan(plan: Plan, catalogue: Catalogue, request: SolvePlanRequest): SolvePlanResult {
  const prepared = preparePlanNetwork(plan, catalogue, request);
  if (!prepared.ok) return prepared;
  const { built, sourceId } = prepared;
  const rx = plan.elements[request.receiver];
  const target = request.target === null ? undefined : request.target ?? (rx?.type === "room" ? rx.target : undefined);
  // The builder already worked out every link's τS (by the engine's formula) to size absorption.
  const compiled = compileNetwork(built.network, { transmittingArea: linkTauSM2 });
  const { result, solved } = solveCompiled(compiled, {
    receiver: request.receiver,
    k: request.k ?? 10,
    ...(request.gains !== undefined ? { gains: request.gains } : {}),
    ...(target ? { target: engineTargetOf(target) } : {}),
  });
  const onPlan = mapResultToPlan(plan, built, result);
  const estimated = onPlan.elements.filter((e) => !e.gainExact && e.kind !== "flanking" && e.share > 0).slice(0, request.exactPartGains ?? 5);
  const exact = exactPartGainsDb(solved, estimated.map((e) => ({ elementId: e.elementId, linkId: e.linkIds[0]! })));
  for (const e of onPlan.elements) {
    const g = exact.get(e.elementId);
    if (g !== undefined && Number.isFinite(g)) {
      e.gainIfPerfectDb = g;
      e.gainExact = true;
    }
  }
  return { ok: true, result, onPlan, assumptions: built.assumptions, built, sourceId };
}
