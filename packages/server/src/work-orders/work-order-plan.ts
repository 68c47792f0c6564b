/**
 * What a work order says for one upgrade: materials and quantities from the element's areas and
 * lengths, the steps of its family, and a checklist. Quantities carry 10 % waste on sheet goods
 * (common practice).
 */
import type { ProposalContent, ScenarioLine } from "@hushmark/schemas";

interface ElementSize {
  widthM?: number;
  heightM?: number;
  lengthM?: number;
}

const WASTE = 1.1;
const r1 = (v: number) => Math.round(v * 10) / 10;

export interface WorkOrderDraft {
  title: string;
  elementId: string;
  elementName: string;
  materials: { name: string; quantity: number; unit: string }[];
  steps: string[];
  cautions: { code: string; text: string }[];
  tasks: string[];
}

const STEPS: Record<string, string[]> = {
  sealing: ["Clean and inspect the gap; note its size against the survey.", "Fit the seal or sealant to the maker's instructions, continuous with no breaks.", "Check the door or cover closes and opens without force; check light does not show through."],
  mass: ["Protect floors and furniture; mark services (outlets, pipes) on the surface.", "Fix the new layer or unit, staggering joints against the layer below.", "Seal the perimeter and every penetration with acoustic sealant.", "Make good, finish and clean."],
  decoupling: ["Protect floors and furniture; mark services on the surface.", "Fix the resilient mounts or independent frame, keeping it free of rigid contact with the existing structure.", "Fill the cavity with insulation; fit boards with staggered joints.", "Seal the perimeter with acoustic sealant; leave a gap at the floor and ceiling, then seal it.", "Make good, finish and clean."],
  damping: ["Protect floors and furniture; mark services.", "Apply the damping compound to the new board at the maker's coverage.", "Fix the board within the compound's open time; seal the perimeter.", "Make good, finish and clean."],
  ducts: ["Isolate the fan and ventilation system before opening the duct.", "Fit the lining, baffle or silencer; keep the free area the system needs.", "Restart the system and check the airflow at the grille."],
  impact: ["Agree access and times with the neighbour or occupier where needed.", "Lay or fix the impact layer to the maker's instructions.", "Check doors clear the new floor height; make good thresholds."],
};

function materials(line: ScenarioLine, size: ElementSize, effectKind: string): WorkOrderDraft["materials"] {
  const area = line.areaM2;
  const perimeter = size.widthM && size.heightM ? 2 * size.heightM + size.widthM : undefined;
  switch (effectKind) {
    case "sealed-gap":
      if (perimeter !== undefined && /perimeter/i.test(line.code + line.name)) return [{ name: line.name, quantity: r1(perimeter), unit: "m" }];
      return [{ name: line.name, quantity: 1, unit: "item" }, { name: "Acoustic sealant (310 ml tube)", quantity: 1, unit: "tube" }];
    case "construction":
      return [{ name: line.name, quantity: 1, unit: "item" }, { name: "Acoustic sealant (310 ml tube)", quantity: Math.max(1, Math.ceil((perimeter ?? 6) / 8)), unit: "tube" }];
    case "added-layer": {
      const boardM2 = r1(area * WASTE);
      const tubes = Math.max(1, Math.ceil((size.lengthM ?? Math.sqrt(area)) * 2 / 8));
      return [{ name: line.name, quantity: boardM2, unit: "m²" }, { name: "Acoustic sealant (310 ml tube)", quantity: tubes, unit: "tube" }];
    }
    case "impact-improvement":
      return [{ name: line.name, quantity: r1(area * WASTE), unit: "m²" }];
    default:
      return [{ name: line.name, quantity: 1, unit: "item" }];
  }
}

/** One work order per upgrade line of the approved proposal. */
export function workOrderDrafts(content: ProposalContent, plan: { elements: Record<string, unknown> }, effectKinds: Map<string, string>): WorkOrderDraft[] {
  return content.evaluation.lines.map((line) => {
    const el = plan.elements[line.elementId] as ElementSize | undefined;
    const size: ElementSize = { ...(el?.widthM ? { widthM: el.widthM } : {}), ...(el?.heightM ? { heightM: el.heightM } : {}), ...(el?.lengthM ? { lengthM: el.lengthM } : {}) };
    const steps = STEPS[line.family] ?? STEPS.mass!;
    const tasks = [
      ...(line.cautions.length ? ["Read the cautions with the crew and check the site for them."] : []),
      ...steps,
      "Photograph the finished work.",
      "Leave the area clean and tell the client it is done.",
    ];
    return {
      title: `${line.name} — ${line.elementName}`,
      elementId: line.elementId,
      elementName: line.elementName,
      materials: materials(line, size, effectKinds.get(line.priceBookItemId) ?? ""),
      steps,
      cautions: line.cautions,
      tasks,
    };
  });
}
