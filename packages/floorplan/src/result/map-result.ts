import { A_WEIGHTING_DB } from "../catalogue/bands.js";
import type { LinkInput, LinkTrace, SpaceTrace } from "../builder/types.js";
import type { Plan, Point } from "../document/schema.js";
import type { ElementResult, PathOnPlan, PathPoint, PathStep, PlanResult, SolveResultLike } from "./types.js";

type Built = { network: { links?: LinkInput[] }; links: Record<string, LinkTrace>; spaces: Record<string, SpaceTrace> };

/** τ·S of one partition part per band, m² (open: τ = 1; Dn,e: A0·10^(−Dn,e/10), A0 = 10 m²). */
function partTauS(part: Extract<LinkInput, { parts: unknown }>["parts"][number], band: number): number {
  if ("open" in part && part.open) return part.area_m2;
  if ("dne_db" in part) return 10 * 10 ** (-part.dne_db[band]! / 10);
  if ("tl_db" in part) return part.area_m2 * 10 ** (-part.tl_db[band]! / 10);
  return 0;
}

/** Each element's fraction of its link's transmitted energy per band (no unit). */
function elementFractions(link: LinkInput, bands: number): Map<string, number[]> {
  const out = new Map<string, number[]>();
  if (link.type === "partition" || link.type === undefined) {
    const parts = link.parts;
    for (let b = 0; b < bands; b++) {
      const total = parts.reduce((s, p) => s + partTauS(p, b), 0);
      for (const p of parts) {
        const ref = p.ref ?? link.ref ?? link.id;
        const list = out.get(ref) ?? new Array(bands).fill(0);
        list[b] += total > 0 ? partTauS(p, b) / total : 0;
        out.set(ref, list);
      }
    }
    return out;
  }
  out.set(link.type === "flanking" ? link.id : link.ref ?? link.id, new Array(bands).fill(1));
  return out;
}

function kindOf(plan: Plan, elementId: string, trace: LinkTrace | undefined): ElementResult["kind"] {
  const el = plan.elements[elementId];
  if (el?.type === "door" || el?.type === "window" || el?.type === "penetration") return el.type;
  if (el?.type === "duct" || trace?.kind === "vent") return "vent";
  if (trace?.kind === "exterior-wall") return "wall";
  return trace?.kind ?? "wall";
}

/**
 * Maps an engine result back onto the plan: for every wall piece, opening, duct, floor and
 * flanking path its A-weighted share of the receiver's energy and its gain if it were perfect
 * (exact from the engine for whole links; for one element of a wall, estimated to first order as
 * −10·lg(1 − share), which is exact when its sound reaches the receiver in one hop), and for
 * each strongest path the plan elements it passes in order and a line through them for drawing.
 */
export function mapResultToPlan(plan: Plan, built: Built, result: SolveResultLike): PlanResult {
  const bands = result.levelsDb.length;
  const weight = result.levelsDb.map((l, b) => 10 ** ((l + (A_WEIGHTING_DB[b] ?? 0)) / 10));
  const wTotal = weight.reduce((s, w) => s + w, 0);
  const linkById = new Map((built.network.links ?? []).map((l) => [l.id, l]));
  const acc = new Map<string, ElementResult>();
  const fractionsByLink = new Map<string, Map<string, number[]>>();
  for (const lr of result.links) {
    const link = linkById.get(lr.id);
    if (!link) continue;
    const trace = built.links[lr.id];
    const fractions = elementFractions(link, bands);
    fractionsByLink.set(lr.id, fractions);
    for (const [elementId, frac] of fractions) {
      const e: ElementResult = acc.get(elementId) ?? {
        elementId, kind: kindOf(plan, elementId, trace), name: elementName(plan, elementId, link),
        linkIds: [], share: 0, shareByBand: new Array<number>(bands).fill(0), gainIfPerfectDb: 0, gainExact: false,
      };
      e.linkIds.push(lr.id);
      frac.forEach((f, b) => (e.shareByBand[b]! += f * (lr.shareByBand[b] ?? 0)));
      const whole = fractions.size === 1;
      if (whole && e.linkIds.length === 1 && lr.gainIfPerfectDb !== undefined) {
        e.gainIfPerfectDb = lr.gainIfPerfectDb;
        e.gainExact = true;
      }
      acc.set(elementId, e);
    }
  }
  const elements = [...acc.values()];
  for (const e of elements) {
    e.share = wTotal > 0 ? e.shareByBand.reduce((s, sh, b) => s + sh * weight[b]!, 0) / wTotal : 0;
    if (!e.gainExact) {
      const after = e.shareByBand.reduce((s, sh, b) => s + weight[b]! * Math.max(1 - sh, 1e-9), 0);
      e.gainIfPerfectDb = wTotal > 0 ? 10 * Math.log10(wTotal / after) : 0;
    }
  }
  elements.sort((a, b) => b.share - a.share || (a.elementId < b.elementId ? -1 : 1));
  const elementShare = new Map(elements.map((e) => [e.elementId, e.share]));
  const paths = result.paths.map((p) => pathOnPlan(p, built, fractionsByLink, elementShare));
  return { elements, paths };
}

function elementName(plan: Plan, elementId: string, link: LinkInput): string {
  const el = plan.elements[elementId];
  if (el && "name" in el && typeof el.name === "string" && el.name) return el.name;
  return link.name ?? elementId;
}

function pathOnPlan(
  p: SolveResultLike["paths"][number],
  built: Built,
  fractionsByLink: Map<string, Map<string, number[]>>,
  elementShare: Map<string, number>,
): PathOnPlan {
  const steps: PathStep[] = [];
  const polyline: PathPoint[] = [];
  const addSpace = (id: string) => {
    steps.push({ kind: "space", spaceId: id });
    const t = built.spaces[id];
    if (t?.centre) polyline.push({ ...t.centre, levelId: t.levelId });
  };
  const addLink = (id: string) => {
    const trace = built.links[id];
    const fractions = fractionsByLink.get(id);
    // The element carrying most of the link's sound is where the path crosses it.
    const candidates = fractions ? [...fractions.keys()] : trace?.refs.slice(0, 1) ?? [id];
    const elementId = candidates.reduce((best, c) => ((elementShare.get(c) ?? 0) > (elementShare.get(best) ?? 0) ? c : best), candidates[0] ?? id);
    steps.push({ kind: "element", elementId, linkId: id, refs: trace?.refs ?? [] });
    const point: Point | undefined = trace?.points?.[elementId] ?? midpoint(trace?.polyline ?? []);
    if (point) polyline.push({ ...point, levelId: trace?.levelId ?? null });
  };
  const impact = p.links.length === p.spaces.length;
  p.spaces.forEach((s, i) => {
    if (impact) addLink(p.links[i]!);
    addSpace(s);
    if (!impact && i < p.links.length) addLink(p.links[i]!);
  });
  return { rank: p.rank, kind: p.kind, share: p.share, dba: p.dba, steps, polyline };
}

function midpoint(points: readonly Point[]): Point | undefined {
  if (points.length === 0) return undefined;
  if (points.length === 1) return points[0];
  const a = points[0]!, b = points[points.length - 1]!;
  return { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
}
