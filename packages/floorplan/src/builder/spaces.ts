import { ASSUMED_RT60_S, finishPreset } from "../catalogue/finishes.js";
import { elementsOfType } from "../document/elements.js";
import { OUTDOORS_ID } from "../document/ids.js";
import type { Finish } from "../document/schema.js";
import { polygonAreaM2, polygonCentroid, polygonPerimeterM, roomVolumeM3 } from "../geometry/polygon.js";
import type { SpaceInput, SpaceTrace } from "./types.js";
import { levelHeightM, type BuildContext } from "./context.js";

/** Assumed size of an un-surveyed neighbour: a furnished room of 50 m³ with 10 m² absorption. */
export const NEIGHBOUR_DEFAULTS = { volumeM3: 50, absorptionM2: 10 } as const;
/** Mean absorption coefficient of a void with no finish recorded (typical assumption). */
export const VOID_ALPHA = 0.15;


/** Absorption fields for a space from its finish: preset → A = Σα·S per band, else as given (m², s). */
export function absorptionFields(finish: Finish | undefined, surfaceM2: number, fallbackAlpha?: number): Pick<SpaceInput, "absorption_m2" | "rt60_s"> {
  if (!finish) return fallbackAlpha !== undefined ? { absorption_m2: Math.max(surfaceM2 * fallbackAlpha, 0.01) } : { rt60_s: ASSUMED_RT60_S };
  if (finish.kind === "rt60") return { rt60_s: finish.rt60S };
  if (finish.kind === "absorption") return { absorption_m2: finish.absorptionM2 };
  const preset = finishPreset(finish.presetId) ?? finishPreset("furnished")!;
  return { absorption_m2: preset.alpha.map((a) => Math.max(a * surfaceM2, 0.01)) };
}

/** Extra absorption when a given absorption area is smaller than what the space's links let out (no unit). */
export const TRANSMISSION_MARGIN = 1.05;

/**
 * Absorption per band that includes what leaves through the links, m² (the network format takes
 * A as given, so it must). Drawn-surface absorption (presets, assumed values) gets the links' τS
 * added; a measured figure already contains it and is only raised where the links would let out
 * more than it, which the caller reports.
 */
export function absorptionWithLinks(space: SpaceInput, outM2: readonly number[], measured: boolean): { absorption: number[]; raised: boolean } {
  const given = outM2.map((_, b) => {
    const a = space.absorption_m2;
    if (a !== undefined) return typeof a === "number" ? a : a[b]!;
    const t = space.rt60_s;
    const rt = t === undefined ? ASSUMED_RT60_S : typeof t === "number" ? t : t[b]!;
    return (0.16 * (space.volume_m3 ?? 0)) / rt;
  });
  if (!measured) return { absorption: given.map((a, b) => a + outM2[b]!), raised: false };
  let raised = false;
  const absorption = given.map((a, b) => {
    const need = TRANSMISSION_MARGIN * outM2[b]!;
    if (a >= need) return a;
    raised = true;
    return need;
  });
  return { absorption, raised };
}

/** Network spaces for rooms, voids, neighbours and the outdoors, with where each sits on the plan. */
export function buildSpaces(ctx: BuildContext, needsOutdoors: boolean): { spaces: SpaceInput[]; traces: Record<string, SpaceTrace>; measured: Set<string> } {
  const spaces: SpaceInput[] = [];
  // Spaces whose absorption was measured or entered (it already includes what leaves through the links).
  const measured = new Set<string>();
  const traces: Record<string, SpaceTrace> = {};
  for (const room of ctx.rooms.values()) {
    const h = levelHeightM(ctx, room.levelId);
    const area = polygonAreaM2(room.outline);
    const surface = 2 * area + polygonPerimeterM(room.outline) * h;
    spaces.push({
      id: room.id, kind: "room", name: room.name, ref: room.id, volume_m3: roomVolumeM3(area, h),
      ...absorptionFields(room.finish, surface),
      ...(room.use === "bedroom" || room.use === "nursery" ? { sleeping_room: true } : {}),
    });
    if (room.finish && room.finish.kind !== "preset") measured.add(room.id);
    traces[room.id] = { spaceId: room.id, levelId: room.levelId, centre: polygonCentroid(room.outline) };
  }
  for (const v of elementsOfType(ctx.plan, "void")) {
    const area = polygonAreaM2(v.outline);
    const surface = 2 * area + polygonPerimeterM(v.outline) * v.depthM;
    spaces.push({
      id: v.id, kind: v.kind === "ceiling-void" ? "void" : v.kind, name: v.name, ref: v.id,
      volume_m3: Math.max(area * v.depthM, 0.01), ...absorptionFields(v.finish, surface, VOID_ALPHA),
    });
    if (v.finish && v.finish.kind !== "preset") measured.add(v.id);
    traces[v.id] = { spaceId: v.id, levelId: v.levelId, centre: polygonCentroid(v.outline) };
  }
  for (const n of elementsOfType(ctx.plan, "neighbour")) {
    spaces.push({ id: n.id, kind: "neighbour", name: n.name, ref: n.id, volume_m3: n.volumeM3 ?? NEIGHBOUR_DEFAULTS.volumeM3, absorption_m2: n.absorptionM2 ?? NEIGHBOUR_DEFAULTS.absorptionM2 });
    if (n.absorptionM2 !== undefined) measured.add(n.id);
    traces[n.id] = { spaceId: n.id, levelId: null, centre: null };
  }
  if (needsOutdoors) {
    spaces.push({ id: OUTDOORS_ID, kind: "outdoors", name: "Outdoors" });
    traces[OUTDOORS_ID] = { spaceId: OUTDOORS_ID, levelId: null, centre: null };
  }
  return { spaces, traces, measured };
}
