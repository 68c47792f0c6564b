/**
 * Price book upgrade + plan element → the engine's upgrade option on the element's network link.
 * Part ids follow the builder: `<piece>:wall`, `<opening>:leaf`, `:undercut`, `:perimeter`, `:open`.
 */
import { bandCount, checkOption, upgradeOptionSchema, type Link, type Network, type Part, type UpgradeAction, type UpgradeOption } from "@hushmark/acoustics";
import type { Catalogue } from "@hushmark/floorplan";
import type { PriceBookItem, UpgradeTargetKind } from "@hushmark/schemas";

export interface ElementOnNetwork {
  link: Link;
  kind: UpgradeTargetKind;
  name: string;
  /** The TL part the element is (wall surface, door leaf, glazing), when it has one. */
  part?: Part;
}

const KIND_WORDS: Record<UpgradeTargetKind, string> = { wall: "a wall", door: "a door", window: "a window", penetration: "a penetration", floor: "a floor", ceiling: "a ceiling", vent: "a vent or duct" };

/** Where a plan element sits in the network, or undefined when no link carries it. */
export function locateElement(network: Network, elementId: string): ElementOnNetwork | undefined {
  const byId = new Map(network.links.map((l) => [l.id, l]));
  const floor = byId.get(`floor:${elementId}`) ?? byId.get(`ceiling:${elementId}`);
  if (floor) return { link: floor, kind: floor.id.startsWith("ceiling:") ? "ceiling" : "floor", name: floor.name ?? elementId };
  const duct = byId.get(`duct:${elementId}`);
  if (duct) return { link: duct, kind: "vent", name: duct.name ?? elementId };
  const wall = byId.get(`wall:${elementId}`);
  if (wall && wall.type === "partition") {
    const part = wall.parts.find((p) => p.id === `${elementId}:wall`);
    return { link: wall, kind: "wall", name: wall.name ?? elementId, ...(part ? { part } : {}) };
  }
  for (const link of network.links) {
    if (link.type !== "partition") continue;
    const parts = link.parts.filter((p) => p.ref === elementId);
    if (parts.length === 0) continue;
    const leaf = parts.find((p) => p.id === `${elementId}:leaf`);
    const open = parts.find((p) => p.id === `${elementId}:open`);
    const kind: UpgradeTargetKind = open ? "penetration" : leaf?.kind === "window" ? "window" : "door";
    return { link, kind, name: (leaf ?? open ?? parts[0]!).name ?? elementId, ...(leaf ? { part: leaf } : {}) };
  }
  return undefined;
}

type Outcome = { ok: true; option: UpgradeOption; element: ElementOnNetwork } | { ok: false; message: string };

function action(item: PriceBookItem, elementId: string, at: ElementOnNetwork, catalogue: Catalogue): UpgradeAction | string {
  const e = item.effect;
  switch (e.kind) {
    case "construction": {
      const c = catalogue.constructions[e.constructionId];
      if (!c) return `“${item.name}” names construction “${e.constructionId}”, which is not in the catalogue; fix it in the price book.`;
      if (!at.part) return `${at.name} has no surface of its own to replace.`;
      return { kind: "replace-part", part: at.part.id ?? "", tl_db: [...c.tlDb], construction: c.id, ...(c.source.kind === "estimate" ? { estimate: true } : {}) };
    }
    case "added-layer":
      if (at.link.type === "floor") return { kind: "add-layer", delta_tl_db: e.deltaTlDb };
      if (!at.part) return `${at.name} has no surface to add a layer to.`;
      return { kind: "add-layer", part: at.part.id ?? "", delta_tl_db: e.deltaTlDb };
    case "sealed-gap": {
      const id = `${elementId}:${e.gap === "opening" ? "open" : e.gap}`;
      if (at.link.type !== "partition" || !at.link.parts.some((p) => p.id === id)) {
        const words = { undercut: "a gap under it", perimeter: "a gap around it", opening: "an opening" }[e.gap];
        return `${at.name} has no ${words.replace(/^an? /, "")} to seal on the plan; note the leak on the plan first.`;
      }
      return { kind: "seal-leak", part: id, remaining_open_area_m2: e.remainingOpenAreaM2 };
    }
    case "duct-attenuation":
      return { kind: "add-duct-attenuation", attenuation_db: e.attenuationDb };
    case "impact-improvement":
      return { kind: "add-impact-improvement", delta_l_db: e.deltaLDb, ...(e.deltaTlDb !== undefined ? { delta_tl_db: e.deltaTlDb } : {}) };
  }
}

/** The engine option for one price book upgrade on one element (key: the option id in the engine). */
export function upgradeOptionFor(key: string, item: PriceBookItem, elementId: string, network: Network, catalogue: Catalogue): Outcome {
  const at = locateElement(network, elementId);
  if (!at) return { ok: false, message: `“${elementId}” is not an element that carries sound to the receiver in this plan version.` };
  if (!item.appliesTo.includes(at.kind)) return { ok: false, message: `“${item.name}” applies to ${item.appliesTo.map((k) => KIND_WORDS[k]).join(" or ")}, not to ${KIND_WORDS[at.kind]} (${at.name}).` };
  const act = action(item, elementId, at, catalogue);
  if (typeof act === "string") return { ok: false, message: act };
  const c = item.costs;
  const option = upgradeOptionSchema.parse({
    id: key,
    name: item.name,
    link: at.link.id,
    action: act,
    cost: { fixed: c.fixedMaterials + c.fixedLabour, per_m2: c.perM2Materials + c.perM2Labour, per_item: c.perItemMaterials + c.perItemLabour, items: 1 },
    labour_h: item.labourHours,
    ...(item.addedThicknessMm > 0 ? { added_thickness_m: item.addedThicknessMm / 1000 } : {}),
    flags: item.flags,
    cautions: item.cautions,
  });
  const issues = checkOption(option, network, bandCount(network.bands), "$");
  if (issues.length > 0) return { ok: false, message: `“${item.name}” cannot go on ${at.name}: ${issues.map((i) => i.message).join("; ")}.` };
  return { ok: true, option, element: at };
}

/** Materials and labour of an option priced on `areaM2` (the engine's area for per-m² prices). */
export function costSplit(item: PriceBookItem, areaM2: number): { materials: number; labour: number } {
  const c = item.costs;
  return { materials: c.fixedMaterials + c.perM2Materials * areaM2 + c.perItemMaterials, labour: c.fixedLabour + c.perM2Labour * areaM2 + c.perItemLabour };
}
