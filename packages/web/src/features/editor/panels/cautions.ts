import type { Plan } from "@hushmark/floorplan";
import { edgeRefParts } from "@hushmark/floorplan";

/** A safety caution shown next to the element it applies to; each defers to local codes and licensed professionals. */
export interface Caution {
  id: string;
  title: string;
  text: string;
}

export const CAUTIONS = {
  egress: { id: "egress", title: "Escape window", text: "A window in a sleeping room may be its emergency escape. Never block it permanently; an insert or plug must come out from inside quickly, without tools. Check local codes." },
  fire: { id: "fire", title: "Fire-rated assemblies", text: "Fire-resistance-rated walls, ceilings and doors keep their rating only as listed assemblies. Penetrations need fire-rated sealant; changing a rated ceiling's mounting can void its rating. Ask a licensed professional." },
  air: { id: "air", title: "Fresh and combustion air", text: "Sealing vents and gaps reduces fresh air. Never starve fuel-burning appliances of combustion air, and keep CO alarms working." },
  lead: { id: "lead", title: "Lead and asbestos", text: "Older buildings may have lead paint or asbestos in plaster, texture or boards: have them tested before cutting or sanding." },
  electrical: { id: "electrical", title: "Electrical boxes", text: "Turn off the circuit before opening a wall; electrical boxes in partitions need care and, where required, a licensed electrician." },
  structural: { id: "structural", title: "Structural load", text: "Added mass on ceilings and floors is a structural load: have it checked before adding layers." },
} satisfies Record<string, Caution>;

const SLEEPING = new Set(["bedroom", "nursery"]);

/** The cautions that apply to one element of the plan. */
export function cautionsFor(plan: Plan, id: string): Caution[] {
  const el = plan.elements[id];
  if (!el) return id.includes("|") ? [CAUTIONS.lead, CAUTIONS.electrical] : [];
  switch (el.type) {
    case "window": {
      const room = plan.elements[edgeRefParts(el.wallRef)?.roomId ?? ""];
      return room?.type === "room" && SLEEPING.has(room.use) ? [CAUTIONS.egress] : [];
    }
    case "door": return [CAUTIONS.fire];
    case "penetration": return el.what === "outlet-box" ? [CAUTIONS.electrical, CAUTIONS.fire] : [CAUTIONS.fire];
    case "vent": case "duct": return [CAUTIONS.air];
    case "wall": return [CAUTIONS.lead, CAUTIONS.electrical];
    case "void": return [CAUTIONS.fire, CAUTIONS.structural];
    default: return [];
  }
}
