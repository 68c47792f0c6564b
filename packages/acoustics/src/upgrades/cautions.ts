/**
 * Safety cautions of an upgrade from its own list, its flags and what it touches. Wording after
 * the product's cautions; every one defers to local codes and licensed professionals.
 */
import type { Link, Network, Part, Space } from "../network/schema.js";
import type { UpgradeOption } from "./schema.js";

export interface Caution {
  readonly code: string;
  readonly text: string;
}

const DEFER = "Defer to local codes and licensed professionals.";

export const CAUTION_TEXT = Object.freeze({
  "escape-opening":
    "A sleeping room's emergency escape window must not be blocked permanently: an insert or plug must come out quickly from inside, without keys or tools (IRC R310: net clear opening ≥ 5.7 ft², ≥ 24 in high, ≥ 20 in wide, sill ≤ 44 in).",
  "fire-rated":
    "This element is part of a fire-resistance-rated assembly: it keeps its rating only as a listed assembly; penetrations need listed firestop systems or fire-rated sealant (ASTM E814 / UL 1479), and changing a rated ceiling's mounting can void its rating.",
  "combustion-air":
    "Sealing vents and gaps reduces fresh air: never starve fuel-burning appliances of combustion air (NFPA 54: about 50 ft³ of room volume per 1000 Btu/h in ordinary construction) and keep CO alarms working.",
  "old-building":
    "The building is older: pre-1978 housing needs lead-safe work practices by certified firms (US EPA RRP, 40 CFR 745), and older textures and joint compound may contain asbestos — test before cutting or sanding.",
  electrical: "Turn off circuits before opening walls or ceilings; electrical boxes in partitions need care (and, in rated walls, listed putty pads).",
  "structural-load":
    "Added mass on a ceiling or floor is a structural load: ceiling joists are commonly sized for about 5–10 psf dead load, so check the structure before adding layers.",
});

type CautionCode = keyof typeof CAUTION_TEXT;

function touchedParts(link: Link, option: UpgradeOption): Part[] {
  if (link.type !== "partition") return [];
  const a = option.action;
  if (!("part" in a) || a.part === undefined) return link.parts;
  const ref = a.part;
  return link.parts.filter((p, i) => (typeof ref === "number" ? i === ref : p.id === ref));
}

function codesFor(option: UpgradeOption, link: Link, spaces: readonly Space[], network: Network): CautionCode[] {
  const codes = new Set<CautionCode>();
  const parts = touchedParts(link, option);
  const kind = option.action.kind;
  const opensSurfaces = kind === "add-layer" || kind === "replace-part" || (kind === "add-impact-improvement" && option.action.delta_tl_db !== undefined);
  const windowish = parts.some((p) => p.kind === "window") || option.flags.includes("blocks-daylight");
  if (windowish && spaces.some((s) => s.sleeping_room)) codes.add("escape-opening");
  if (link.fire_rated || parts.some((p) => p.fire_rated)) codes.add("fire-rated");
  const airtight = kind === "seal-leak" || option.flags.includes("reduces-ventilation") || link.type === "vent";
  if (airtight && (spaces.some((s) => s.fuel_appliance) || option.flags.includes("reduces-ventilation"))) codes.add("combustion-air");
  const year = network.building?.year_built;
  if (opensSurfaces && year !== undefined && year < 1978) codes.add("old-building");
  if (opensSurfaces && link.type !== "vent" && !parts.every((p) => p.kind === "door" || p.kind === "window")) codes.add("electrical");
  const ceilingOrFloor = link.type === "floor" || parts.some((p) => p.kind === "ceiling" || p.kind === "floor");
  if ((ceilingOrFloor && kind === "add-layer") || option.flags.includes("structural-work")) codes.add("structural-load");
  return [...codes];
}

/** Cautions for an option: its own texts, then those its flags and its link call for. */
export function upgradeCautions(option: UpgradeOption, network: Network): Caution[] {
  const link = network.links.find((l) => l.id === option.link);
  const own = option.cautions.map((text) => ({ code: "option", text }));
  if (link === undefined) return own;
  const spaces = network.spaces.filter((s) => link.between.includes(s.id));
  const derived = codesFor(option, link, spaces, network).map((code) => ({ code, text: `${CAUTION_TEXT[code]} ${DEFER}` }));
  return [...own, ...derived];
}
