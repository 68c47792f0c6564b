import { z } from "zod";
import { elementIdSchema } from "./ids.js";
import { underlaySchema } from "./underlays.js";

/** The document's format name; a file without it is not a Hushmark plan. */
export const PLAN_FORMAT = "hushmark-plan";
/** The schema version this code writes; older documents are migrated up on load. */
export const PLAN_SCHEMA_VERSION = 1;

const finite = z.number().finite();
const lengthM = finite.nonnegative();

export const pointSchema = z.object({ x: finite, y: finite });
export type Point = z.infer<typeof pointSchema>;

/** A polygon corner with a stable id; the edge from this vertex to the next is named after it. */
export const vertexSchema = z.object({ id: elementIdSchema, x: finite, y: finite });
export type Vertex = z.infer<typeof vertexSchema>;

export const roomUseSchema = z.enum([
  "bedroom", "nursery", "living", "dining", "kitchen", "bathroom", "office", "meeting",
  "studio", "control-room", "cinema", "classroom", "retail", "cafe", "corridor", "stair",
  "plant", "storage", "other",
]);
export type RoomUse = z.infer<typeof roomUseSchema>;

/** How a room's sound absorption is known: a finish preset, a measured reverberation time or an absorption area. */
export const finishSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("preset"), presetId: z.string().min(1) }),
  z.object({ kind: z.literal("rt60"), rt60S: finite.positive() }),
  z.object({ kind: z.literal("absorption"), absorptionM2: finite.positive() }),
]);
export type Finish = z.infer<typeof finishSchema>;

export const targetSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("nc"), nc: finite }),
  z.object({ kind: z.literal("dba"), dba: finite }),
  z.object({ kind: z.literal("reduction"), reductionDb: finite }),
]);
export type Target = z.infer<typeof targetSchema>;

const layerSchema = z.object({ constructionId: z.string().min(1), coveringId: z.string().min(1).optional() });

export const levelSchema = z.object({
  type: z.literal("level"),
  id: elementIdSchema,
  name: z.string(),
  elevationM: finite,
  /** Floor-to-ceiling height; may be missing while the surveyor is still drawing. */
  heightM: finite.optional(),
});

export const roomSchema = z.object({
  type: z.literal("room"),
  id: elementIdSchema,
  levelId: elementIdSchema,
  name: z.string(),
  use: roomUseSchema,
  /** Outline at the wall centrelines, metres in plan coordinates, either winding. */
  outline: z.array(vertexSchema),
  finish: finishSchema.optional(),
  target: targetSchema.optional(),
  /** The floor under this room (also the floor/ceiling to the room below). */
  floor: layerSchema.optional(),
  /** The ceiling lining towards a void above (suspended ceiling, plasterboard). */
  ceiling: layerSchema.optional(),
});

/** A free-standing interior wall drawn on its own, not from a room outline. */
export const wallSchema = z.object({
  type: z.literal("wall"),
  id: elementIdSchema,
  levelId: elementIdSchema,
  start: pointSchema,
  end: pointSchema,
  constructionId: z.string().min(1),
  thicknessM: lengthM,
  heightM: lengthM.optional(),
});

export const leaksSchema = z.object({
  /** Gap under a door leaf, mm. */
  undercutMm: lengthM.default(0),
  /** Gap round the sides and head of a leaf or sash, mm. */
  perimeterGapMm: lengthM.default(0),
  /** Seals fitted but torn, flattened or painted over. */
  sealsCracked: z.boolean().default(false),
});
export type Leaks = z.infer<typeof leaksSchema>;

/**
 * Openings sit on a wall host: a room edge ref `room:vertex` (offset from that vertex along the
 * edge) or the id of a free-standing wall (offset from its start).
 */
const hostedFields = {
  id: elementIdSchema,
  name: z.string().optional(),
  wallRef: z.string().min(1),
  offsetM: finite,
  widthM: lengthM,
};

export const doorSchema = z.object({
  type: z.literal("door"),
  ...hostedFields,
  heightM: lengthM,
  constructionId: z.string().min(1),
  leaks: leaksSchema.optional(),
});

export const windowSchema = z.object({
  type: z.literal("window"),
  ...hostedFields,
  heightM: lengthM,
  sillM: lengthM.default(0.9),
  constructionId: z.string().min(1),
  leaks: leaksSchema.optional(),
});

export const penetrationSchema = z.object({
  type: z.literal("penetration"),
  ...hostedFields,
  what: z.enum(["outlet-box", "pipe", "cable-hole", "duct-sleeve", "other"]),
  /** Open area straight through the wall, m². */
  openAreaM2: lengthM,
  heightM: lengthM.default(0),
});

export const ventSchema = z.object({
  type: z.literal("vent"),
  id: elementIdSchema,
  name: z.string().optional(),
  /** The room, void or neighbour the grille opens into. */
  spaceId: z.string().min(1),
  mount: z.enum(["wall", "ceiling", "floor"]),
  position: pointSchema,
  /** Free open area of the grille, m². */
  openAreaM2: finite.positive(),
});

export const ductSchema = z.object({
  type: z.literal("duct"),
  id: elementIdSchema,
  name: z.string().optional(),
  fromVentId: z.string().min(1),
  toVentId: z.string().min(1),
  lengthM: lengthM,
  lining: z.enum(["lined", "bare"]),
  bends: z.number().int().nonnegative().default(0),
  silencerId: z.string().min(1).optional(),
  /** Duct cross-section, m²; defaults to the smaller grille open area. */
  crossSectionM2: finite.positive().optional(),
});

export const voidSchema = z.object({
  type: z.literal("void"),
  id: elementIdSchema,
  name: z.string(),
  kind: z.enum(["ceiling-void", "attic", "crawlspace"]),
  /** The level whose rooms it lies above (ceiling void, attic) or below (crawlspace). */
  levelId: elementIdSchema,
  outline: z.array(vertexSchema),
  depthM: lengthM,
  finish: finishSchema.optional(),
});

/** A space next door that was not surveyed: treated as a room with assumed size and absorption. */
export const neighbourSchema = z.object({
  type: z.literal("neighbour"),
  id: elementIdSchema,
  name: z.string(),
  volumeM3: finite.positive().optional(),
  absorptionM2: finite.positive().optional(),
});

export const pinSchema = z.object({
  type: z.literal("pin"),
  id: elementIdSchema,
  levelId: elementIdSchema,
  position: pointSchema,
  label: z.string(),
  spaceId: z.string().optional(),
});

export const noteSchema = z.object({
  type: z.literal("note"),
  id: elementIdSchema,
  levelId: elementIdSchema,
  position: pointSchema,
  text: z.string(),
});

export const elementSchema = z.discriminatedUnion("type", [
  levelSchema, roomSchema, wallSchema, doorSchema, windowSchema, penetrationSchema,
  ventSchema, ductSchema, voidSchema, neighbourSchema, pinSchema, noteSchema,
]);
export type Element = z.infer<typeof elementSchema>;
export type ElementType = Element["type"];
export type ElementOf<T extends ElementType> = Extract<Element, { type: T }>;
export type Level = ElementOf<"level">;
export type Room = ElementOf<"room">;
export type FreeWall = ElementOf<"wall">;
export type Door = ElementOf<"door">;
export type Window = ElementOf<"window">;
export type Penetration = ElementOf<"penetration">;
export type Opening = Door | Window | Penetration;
export type Vent = ElementOf<"vent">;
export type Duct = ElementOf<"duct">;
export type Void = ElementOf<"void">;
export type Neighbour = ElementOf<"neighbour">;
export type Pin = ElementOf<"pin">;
export type Note = ElementOf<"note">;

/** What lies beyond a wall piece that no other drawn room shares. */
export const facesSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("outdoors") }),
  z.object({ kind: z.literal("neighbour"), neighbourId: z.string().min(1) }),
  z.object({ kind: z.literal("none") }),
]);
export type Faces = z.infer<typeof facesSchema>;

/** Settings for one derived wall piece, keyed by the piece's id. */
export const wallSettingSchema = z.object({
  constructionId: z.string().min(1).optional(),
  thicknessM: lengthM.optional(),
  heightM: lengthM.optional(),
  faces: facesSchema.optional(),
});
export type WallSetting = z.infer<typeof wallSettingSchema>;

export const planDefaultsSchema = z.object({
  interiorWallConstructionId: z.string().min(1),
  exteriorWallConstructionId: z.string().min(1),
  wallThicknessM: lengthM.default(0.1),
  floorConstructionId: z.string().min(1),
  ceilingConstructionId: z.string().min(1),
  /** Unshared wall pieces face this unless their setting says otherwise. */
  exteriorFaces: facesSchema.default({ kind: "outdoors" }),
  /** Edges closer than this (m) and parallel are one shared wall. */
  wallToleranceM: lengthM.default(0.05),
});
export type PlanDefaults = z.infer<typeof planDefaultsSchema>;

export const planSchema = z
  .object({
    format: z.literal(PLAN_FORMAT),
    schemaVersion: z.literal(PLAN_SCHEMA_VERSION),
    id: elementIdSchema,
    name: z.string(),
    displayUnit: z.enum(["metric", "imperial"]).default("metric"),
    defaults: planDefaultsSchema,
    elements: z.record(z.string(), elementSchema),
    wallSettings: z.record(z.string(), wallSettingSchema).default({}),
    /** Drawings traced over, bottom first; left out when there are none. */
    underlays: z.array(underlaySchema).optional(),
  })
  .superRefine((plan, ctx) => {
    for (const [key, el] of Object.entries(plan.elements)) {
      if (key !== el.id) {
        ctx.addIssue({ code: "custom", path: ["elements", key, "id"], message: `element stored under "${key}" has id "${el.id}"` });
      }
    }
    const seen = new Set<string>();
    plan.underlays?.forEach((u, i) => {
      if (seen.has(u.id)) ctx.addIssue({ code: "custom", path: ["underlays", i, "id"], message: `two underlays have the id "${u.id}"` });
      seen.add(u.id);
    });
  });
export type Plan = z.infer<typeof planSchema>;
/** A plan as written by hand or by an older editor: defaults may be missing. */
export type PlanInput = z.input<typeof planSchema>;
