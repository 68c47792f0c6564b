import type { Role } from "@hushmark/schemas";
import { can } from "../../../lib/permissions";

export interface ProjectSection {
  /** The URL segment under /projects/:projectId. */
  slug: string;
  label: string;
  /** What will live here, said plainly until it does. */
  purpose: string;
  clientVisible: boolean;
}

export const projectSections: readonly ProjectSection[] = [
  { slug: "brief", label: "Brief", clientVisible: false, purpose: "What noise is the problem, whether it must be kept in or out, how quiet it must become, the budget, and what the client will accept losing: floor area, daylight, the look of a door, ventilation, structural work." },
  { slug: "sketch", label: "Sketch", clientVisible: true, purpose: "The floor plan drawn on site: rooms, walls, doors, windows, vents and ducts, ceiling voids and the floors between storeys, each with its construction and its visible leaks." },
  { slug: "measure", label: "Measure", clientVisible: false, purpose: "Sound level readings in one-third-octave bands with peak hold, taken at pins on the plan at several places and times, and unattended recordings that catch the night-time or weekly event." },
  { slug: "paths", label: "Paths", clientVisible: true, purpose: "How the sound gets from the source to the listener — straight through, around through a duct, void, gap or window, or through the structure — and where it gets through most, with each element's share." },
  { slug: "options", label: "Options", clientVisible: false, purpose: "Upgrades for each weak link — seal, add mass, decouple, damp, treat ducts, impact measures — combined into scenarios with their received level, cost, lost floor area and labour." },
  { slug: "proposal", label: "Proposal", clientVisible: true, purpose: "The priced scope the client reads and approves: the marked-up plan showing where the sound gets through and what each chosen upgrade buys." },
  { slug: "jobs", label: "Jobs", clientVisible: false, purpose: "Work orders per upgrade with the materials, the steps and the safety cautions for the crew." },
  { slug: "verify", label: "Verify", clientVisible: true, purpose: "Measurements after the work, compared with the prediction and the target." },
];

export function sectionsFor(role: Role): readonly ProjectSection[] {
  return can.seeAllSections(role) ? projectSections : projectSections.filter((section) => section.clientVisible);
}
