import { elementsOfType } from "../document/elements.js";
import { ductAttenuationParts, totalAttenuationDb } from "./ducts.js";
import { spaceName, type BuildContext } from "./context.js";
import type { LinkInput, LinkTrace } from "./types.js";

/** Vent links: one per duct joining grilles in two different spaces, with the run's attenuation. */
export function buildVentLinks(ctx: BuildContext): { links: LinkInput[]; traces: LinkTrace[] } {
  const links: LinkInput[] = [];
  const traces: LinkTrace[] = [];
  for (const duct of elementsOfType(ctx.plan, "duct")) {
    const a = ctx.plan.elements[duct.fromVentId];
    const b = ctx.plan.elements[duct.toVentId];
    if (a?.type !== "vent" || b?.type !== "vent" || a.spaceId === b.spaceId) continue;
    const crossSectionM2 = duct.crossSectionM2 ?? Math.min(a.openAreaM2, b.openAreaM2);
    const parts = ductAttenuationParts(duct, crossSectionM2, duct.silencerId ? ctx.catalogue.silencers[duct.silencerId] : undefined);
    const linkId = `duct:${duct.id}`;
    links.push({
      id: linkId, type: "vent", between: [a.spaceId, b.spaceId], ref: duct.id,
      name: duct.name ?? `Duct from ${spaceName(ctx, a.spaceId)} to ${spaceName(ctx, b.spaceId)}`,
      open_area_m2: crossSectionM2, attenuation_db: totalAttenuationDb(parts), attenuation_parts: parts,
    });
    const host = ctx.plan.elements[a.spaceId];
    const levelA = host && "levelId" in host ? host.levelId : "";
    traces.push({ linkId, kind: "vent", refs: [a.id, duct.id, b.id], levelId: levelA, polyline: [a.position, b.position], spaces: [a.spaceId, b.spaceId] });
  }
  return { links, traces };
}
