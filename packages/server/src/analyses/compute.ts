import { parseNetwork, solveNetwork, type Network, type Target as EngineTarget } from "@hushmark/acoustics";
import {
  BANDS_HZ, buildNetwork, catalogueWith, constructionCatalogue, mapResultToPlan, OUTDOORS_ID, parsePlan, sourceSpectrum,
  type Catalogue, type Construction, type Plan, type Problem,
} from "@hushmark/floorplan";
import type { AnalysisResult, AnalysisTarget, PlanProblem } from "@hushmark/schemas";
import { analysisRequestSchema } from "@hushmark/schemas";
import type { z } from "zod";

export type ParsedAnalysisRequest = z.output<typeof analysisRequestSchema>;

/** What a computation answers: a result, or the reasons the plan or the request cannot be analysed. */
export type AnalysisOutcome =
  | { ok: true; result: Omit<AnalysisResult, "cached" | "computeMs" | "planVersion"> }
  | { ok: false; status: 400 | 422; code: string; message: string; problems: PlanProblem[] };

const problemDto = (p: Problem): PlanProblem => ({
  code: p.code,
  severity: p.severity,
  elementId: p.elementId ?? null,
  message: p.message,
  ...(p.suggestion ? { suggestion: p.suggestion } : {}),
});

export function engineTarget(target: AnalysisTarget | undefined): EngineTarget | undefined {
  if (!target) return undefined;
  if (target.kind === "nc") return { kind: "nc", nc: Math.min(70, Math.max(15, target.nc)) };
  if (target.kind === "dba") return { kind: "level", dba: target.dba };
  return { kind: "reduction", db: target.reductionDb };
}

export function spaceName(plan: Plan, id: string): string {
  if (id === OUTDOORS_ID) return "Outdoors";
  const el = plan.elements[id] as { name?: string } | undefined;
  return el?.name || id;
}

function failure(status: 400 | 422, code: string, message: string, problems: PlanProblem[] = []): AnalysisOutcome {
  return { ok: false, status, code, message, problems };
}

/**
 * Plan document + request → the analysis: builds the network from the plan and the catalogue,
 * solves it exactly, and maps shares, gains and paths back onto plan elements. Pure; runs in a
 * worker thread.
 */
export function computeAnalysis(document: unknown, request: ParsedAnalysisRequest, catalogue: Catalogue = constructionCatalogue): AnalysisOutcome {
  return analyse(document, request, catalogue);
}

/** The same with a firm's own constructions added to the built-in catalogue. */
export function computeAnalysisWith(document: unknown, request: ParsedAnalysisRequest, firmConstructions: Construction[]): AnalysisOutcome {
  return analyse(document, request, firmConstructions.length ? catalogueWith(constructionCatalogue, { constructions: firmConstructions }) : constructionCatalogue);
}

/** The plan built into a parsed network for a request, or why it cannot be. */
export type PreparedNetwork =
  | { ok: true; plan: Plan; built: Extract<ReturnType<typeof buildNetwork>, { ok: true }>; network: Network; sourceId: string }
  | Extract<AnalysisOutcome, { ok: false }>;

/** Parses the plan, builds its network with the request's source and checks the spaces; shared by analyses and scenarios. */
export function prepareNetwork(document: unknown, request: Pick<ParsedAnalysisRequest, "source" | "receiverId">, catalogue: Catalogue): PreparedNetwork {
  const parsed = parsePlan(document);
  if (!parsed.ok) {
    return failure(422, "plan_problems", "The saved plan is not a valid plan document.", parsed.problems.slice(0, 50).map(problemDto)) as Extract<AnalysisOutcome, { ok: false }>;
  }
  const plan = parsed.plan;
  const source = request.source;
  let sources: NonNullable<Parameters<typeof buildNetwork>[2]>["sources"];
  let sourceId: string;
  const fail = (status: 400 | 422, code: string, message: string, problems: PlanProblem[] = []) => failure(status, code, message, problems) as Extract<AnalysisOutcome, { ok: false }>;
  if (source.kind === "airborne") {
    const levels = source.spectrum.kind === "library" ? sourceSpectrum(source.spectrum.id)?.levelsDb : source.spectrum.levelsDb;
    if (!levels) return fail(400, "invalid_input", `There is no source spectrum "${source.spectrum.kind === "library" ? source.spectrum.id : ""}" in the library.`, []);
    sources = [{ type: "airborne", spaceId: source.spaceId, levelsDb: [...levels] }];
    sourceId = source.spaceId;
  } else {
    sources = [{ type: "impact", roomId: source.roomId }];
    sourceId = source.roomId;
  }
  if (sourceId === request.receiverId) return fail(400, "invalid_input", "The source and the receiver are the same space; pick two different ones.");
  const built = buildNetwork(plan, catalogue, { sources });
  if (!built.ok) {
    return fail(422, "plan_problems", "The plan has problems to fix before it can be analysed.", built.problems.filter((p) => p.severity === "error").map(problemDto));
  }
  const spaceIds = new Set(built.network.spaces.map((s) => s.id));
  if (!spaceIds.has(request.receiverId)) return fail(400, "invalid_input", `"${request.receiverId}" is not a room or space of this plan.`);
  if (source.kind === "airborne" && !spaceIds.has(source.spaceId)) return fail(400, "invalid_input", `"${source.spaceId}" is not a room or space of this plan.`);
  const network = parseNetwork(built.network);
  if (!network.ok) {
    return fail(422, "plan_problems", "The plan produced a network the engine cannot read.", network.issues.slice(0, 20).map((i) => ({ code: "network", severity: "error", elementId: null, message: `${i.path}: ${i.message}` })));
  }
  return { ok: true, plan, built, network: network.value, sourceId };
}

function analyse(document: unknown, request: ParsedAnalysisRequest, catalogue: Catalogue): AnalysisOutcome {
  const prepared = prepareNetwork(document, request, catalogue);
  if (!prepared.ok) return prepared;
  const { plan, built, sourceId } = prepared;
  const network = { value: prepared.network };
  const target = engineTarget(request.target);
  const solved = solveNetwork(network.value, { receiver: request.receiverId, k: request.paths, gains: 20, ...(target ? { target } : {}) });
  const onPlan = mapResultToPlan(plan, built, solved);
  const sourceSpace = solved.spaces.find((s) => s.id === sourceId);
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
      receiver: { id: request.receiverId, name: spaceName(plan, request.receiverId), levelsDb: [...solved.levelsDb], dba: solved.dba, nc: solved.nc.value },
      target: solved.shortfall && request.target
        ? {
            kind: request.target.kind,
            value: request.target.kind === "nc" ? request.target.nc : request.target.kind === "dba" ? request.target.dba : request.target.reductionDb,
            met: solved.shortfall.met,
            shortfallDb: solved.shortfall.shortfallDb,
          }
        : null,
      elements: onPlan.elements.map((e) => ({ ...e, shareByBand: [...e.shareByBand] })),
      paths: onPlan.paths.map((p) => ({ rank: p.rank, kind: p.kind, label: `Path ${p.rank} — ${labelFor(p.steps)}`, share: p.share, dba: p.dba, steps: p.steps, polyline: p.polyline })),
      assumptions: built.assumptions.map(problemDto),
    },
  };
}
