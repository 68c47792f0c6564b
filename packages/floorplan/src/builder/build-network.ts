import { NETWORK_FORMAT, NETWORK_FORMAT_VERSION, type Network } from "@hushmark/acoustics";
import type { Catalogue } from "../catalogue/types.js";
import type { Plan } from "../document/schema.js";
import { planWallPieces } from "../geometry/walls.js";
import { planIsAnalysable, validatePlan } from "../validation/validate.js";
import { buildContext } from "./context.js";
import { buildFlankingLinks } from "./flanking.js";
import { buildFloorLinks } from "./floors.js";
import { buildSpaces } from "./spaces.js";
import type { BuildOptions, BuildResult, LinkInput, LinkTrace, NetworkSourceInput } from "./types.js";
import { buildVentLinks } from "./vents.js";
import { buildWallLinks } from "./walls.js";
import { OUTDOORS_ID } from "../document/ids.js";
import { BAND_COUNT } from "../catalogue/bands.js";
import { problem } from "../validation/make.js";
import { absorptionWithLinks } from "./spaces.js";
import { linkTauSM2 } from "./transmitting-area.js";

/**
 * Turns a plan and a catalogue into the engine's network (docs/network-format.md): rooms, voids,
 * neighbours and the outdoors as spaces; walls with their openings and leaks, floors, ceilings,
 * ducts and flanking paths as links, each with `ref` the plan element it came from. A plan with
 * errors is not built: its problems are returned instead. Units as in the network format.
 */
export function buildNetwork(given: Plan, catalogue: Catalogue, options: BuildOptions = {}): BuildResult {
  // A frozen copy of the element record (not of the elements) lets every step share one sorted
  // per-type list for this build; the caller's plan is left as it is.
  const plan: Plan = Object.isFrozen(given.elements) ? given : { ...given, elements: Object.freeze({ ...given.elements }) };
  const pieces = planWallPieces(plan);
  const problems = validatePlan(plan, catalogue, pieces);
  if (!planIsAnalysable(problems)) return { ok: false, problems };
  const ctx = buildContext(plan, catalogue, pieces);
  const parts = [buildWallLinks(ctx), buildFloorLinks(ctx), buildVentLinks(ctx), ...(options.flanking === false ? [] : [buildFlankingLinks(ctx, options.flankingPruneDb)])];
  const links: LinkInput[] = parts.flatMap((p) => p.links);
  const traces: Record<string, LinkTrace> = {};
  for (const p of parts) for (const t of p.traces) traces[t.linkId] = t;
  const needsOutdoors = links.some((l) => l.between.includes(OUTDOORS_ID)) || (options.sources ?? []).some((s) => s.type === "airborne" && s.spaceId === OUTDOORS_ID);
  const { spaces, traces: spaceTraces, measured } = buildSpaces(ctx, needsOutdoors);
  const outM2 = new Map<string, number[]>();
  for (const l of links) {
    for (const end of l.between) {
      const acc = outM2.get(end) ?? new Array<number>(BAND_COUNT).fill(0);
      const tauS = linkTauSM2(l);
      // The network skips the schema pass, so a non-finite number from odd geometry is caught here.
      if (!tauS.every(Number.isFinite)) throw new Error(`builder produced a link with a non-finite transmitting area: ${l.id}`);
      for (let b = 0; b < BAND_COUNT; b++) acc[b]! += tauS[b]!;
      outM2.set(end, acc);
    }
  }
  const assumptions = [...problems];
  for (const space of spaces) {
    if (space.kind === "outdoors") continue;
    const { absorption, raised } = absorptionWithLinks(space, outM2.get(space.id) ?? new Array<number>(BAND_COUNT).fill(0), measured.has(space.id));
    delete space.rt60_s;
    space.absorption_m2 = absorption.map((a) => Math.max(a, 1e-6));
    if (raised) assumptions.push(problem("absorption-raised", space.ref ?? space.id, `The absorption recorded for ${space.name ?? space.id} is less than the sound its walls, floors and vents let out in some bands; it was raised to match.`, "Check the measured reverberation time or absorption, and the constructions around the space."));
  }
  const sources: NetworkSourceInput[] = [];
  for (const s of options.sources ?? []) {
    if (s.type === "airborne") {
      sources.push({ type: "airborne", space: s.spaceId, levels_db: [...s.levelsDb] });
    } else {
      for (const l of links) {
        if (l.type !== "floor" || l.between[0] !== s.roomId || !("impact" in l) || !l.impact) continue;
        sources.push({ type: "impact", floor: l.id, ...(s.lnOffsetDb ? { ln_db: l.impact.ln_db.map((v) => v + s.lnOffsetDb!) } : {}) });
      }
    }
  }
  const network: Network = { format: NETWORK_FORMAT, version: NETWORK_FORMAT_VERSION, bands: "third-octave", name: plan.name, spaces, links, sources };
  return { ok: true, network, links: traces, spaces: spaceTraces, assumptions };
}
