import type { Network, Target as EngineTarget } from "@hushmark/acoustics";
import {
  ANALYSIS_REQUEST_PROBLEM, BANDS_HZ, catalogueWith, constructionCatalogue, engineTargetOf, OUTDOORS_ID, parsePlan, preparePlanNetwork, solvePlan,
  type AnalysisSource, type Catalogue, type Construction, type Plan, type PreparedPlanNetwork, type Problem,
} from "@hushmark/floorplan";
import type { AnalysisResult, AnalysisTarget, PlanProblem } from "@hushmark/schemas";
import { analysisRequestSchema } from "@hushmark/schemas";
import type { z } from "zod";

export type ParsedAnalysisRequest = z.output<typeof analysisRequestSchema>;

/** What a computation answers: a result, or the reasons the plan or the request cannot be analysed. */
export type AnalysisOutcome =
  | { ok: true; result: Omit<AnalysisResult, "cached" | "computeMs" | "planVersion"> }
  | { ok: false; status: 400 | 422; code: string; message: string; problems: PlanProblem[] };

type Failure = Extract<AnalysisOutcome, { ok: false }>;

const problemDto = (p: Problem): PlanProblem => ({
  code: p.code,
  severity: p.severity,
  elementId: p.elementId ?? null,
  message: p.message,
  ...(p.suggestion ? { suggestion: p.suggestion } : {}),
});

export function engineTarget(target: AnalysisTarget | undefined): EngineTarget | undefined {
  return target ? engineTargetOf(target) : undefined;
}

export function spaceName(plan: Plan, id: string): string {
  if (id === OUTDOORS_ID) return "Outdoors";
  const el = plan.elements[id] as { name?: string } | undefined;
  return el?.name || id;
}

function failure(status: 400 | 422, code: string, message: string, problems: PlanProblem[] = []): Failure {
  return { ok: false, status, code, message, problems };
}

/** The floorplan's problems as an answer: the request's own mistakes are 400, a plan that cannot be analysed 422. */
function failureOf(problems: readonly Problem[]): Failure {
  const asked = problems.find((p) => p.code === ANALYSIS_REQUEST_PROBLEM);
  if (asked) return failure(400, "invalid_input", asked.message);
  return failure(422, "plan_problems", "The plan has problems to fix before it can be analysed.", problems.filter((p) => p.severity === "error").map(problemDto));
}

/** The API's source in the floorplan's terms. */
function planSource(source: ParsedAnalysisRequest["source"]): AnalysisSource {
  if (source.kind === "impact") return { impactOnRoomId: source.roomId };
  return source.spectrum.kind === "library" ? { spaceId: source.spaceId, spectrumId: source.spectrum.id } : { spaceId: source.spaceId, levelsDb: [...source.spectrum.levelsDb] };
}

function planOf(document: unknown): { ok: true; plan: Plan } | Failure {
  const parsed = parsePlan(document);
  if (parsed.ok) return { ok: true, plan: parsed.plan };
  return failure(422, "plan_problems", "The saved plan is not a valid plan document.", parsed.problems.slice(0, 50).map(problemDto));
}

/** The built-in catalogue with a firm's own constructions added. */
export function catalogueFor(firmConstructions: readonly Construction[]): Catalogue {
  return firmConstructions.length ? catalogueWith(constructionCatalogue, { constructions: [...firmConstructions] }) : constructionCatalogue;
}

/**
 * Plan document + request → the analysis, by the floorplan's `solvePlan` (the command line's
 * own path): builds the network from the plan and the catalogue, solves it exactly, maps shares,
 * gains (exact for the strongest doors and wall parts too) and paths back onto plan elements.
 * Pure; runs in a worker thread.
 */
export function computeAnalysis(document: unknown, request: ParsedAnalysisRequest, catalogue: Catalogue = constructionCatalogue): AnalysisOutcome {
  const parsed = planOf(document);
  if (!parsed.ok) return parsed;
  const plan = parsed.plan;
  // Only the request's (or the brief's) target: the room's own target is the editor's default, not the API's.
  const solved = solvePlan(plan, catalogue, { source: planSource(request.source), receiver: request.receiverId, k: request.paths, gains: 20, target: request.target ?? null });
  if (!solved.ok) return failureOf(solved.problems);
  const { result, onPlan, built, sourceId } = solved;
  const sourceSpace = result.spaces.find((s) => s.id === sourceId);
  const elementNames = new Map(onPlan.elements.map((e) => [e.elementId, e.name]));
  const labelFor = (steps: (typeof onPlan.paths)[number]["steps"]) => {
    const via = steps.flatMap((s) => (s.kind === "element" ? [elementNames.get(s.elementId) ?? spaceName(plan, s.elementId)] : []));
    return via.length ? `via ${via.join(", then ")}` : "direct";
  };
  return {
    ok: true,
    result: {
      bandsHz: [...BANDS_HZ],
      source: { id: sourceId, name: spaceName(plan, sourceId), levelsDb: [...(sourceSpace?.levelsDb ?? [])], dba: sourceSpace?.dba ?? 0 },
      receiver: { id: request.receiverId, name: spaceName(plan, request.receiverId), levelsDb: [...result.levelsDb], dba: result.dba, nc: result.nc.value },
      target: result.shortfall && request.target
        ? {
            kind: request.target.kind,
            value: request.target.kind === "nc" ? request.target.nc : request.target.kind === "dba" ? request.target.dba : request.target.reductionDb,
            met: result.shortfall.met,
            shortfallDb: result.shortfall.shortfallDb,
          }
        : null,
      elements: onPlan.elements.map((e) => ({ ...e, shareByBand: [...e.shareByBand] })),
      paths: onPlan.paths.map((p) => ({ rank: p.rank, kind: p.kind, label: `Path ${p.rank} — ${labelFor(p.steps)}`, share: p.share, dba: p.dba, steps: p.steps, polyline: p.polyline })),
      assumptions: built.assumptions.map(problemDto),
    },
  };
}

/** The same with a firm's own constructions added to the built-in catalogue. */
export function computeAnalysisWith(document: unknown, request: ParsedAnalysisRequest, firmConstructions: Construction[]): AnalysisOutcome {
  return computeAnalysis(document, request, catalogueFor(firmConstructions));
}

/** The plan built into the engine's network for a request, or why it cannot be. */
export type PreparedNetwork =
  | { ok: true; plan: Plan; built: Extract<PreparedPlanNetwork, { ok: true }>["built"]; network: Network; sourceId: string }
  | Failure;

/** Parses the plan and builds its network with the request's source, as `solvePlan` does; for scenarios. */
export function prepareNetwork(document: unknown, request: Pick<ParsedAnalysisRequest, "source" | "receiverId">, catalogue: Catalogue): PreparedNetwork {
  const parsed = planOf(document);
  if (!parsed.ok) return parsed;
  const prepared = preparePlanNetwork(parsed.plan, catalogue, { source: planSource(request.source), receiver: request.receiverId });
  if (!prepared.ok) return failureOf(prepared.problems);
  return { ok: true, plan: parsed.plan, built: prepared.built, network: prepared.built.network, sourceId: prepared.sourceId };
}
