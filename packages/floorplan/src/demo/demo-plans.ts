import type { Plan } from "../document/schema.js";
import { cinemaUnderNurseryPlan } from "./cinema-under-nursery.js";
import { fernhollowStudioPlan } from "./fernhollow-studio.js";

/** A demo plan with the analysis a practitioner would start from. */
export interface DemoPlan {
  file: string;
  plan: Plan;
  /** The usual first question: source space, library spectrum, receiving room. */
  analysis: { source: string; spectrumId: string; receiver: string };
}

/** The demo plans shipped in examples/ (invented scenarios). */
export function demoPlans(): DemoPlan[] {
  return [
    { file: "fernhollow-studio.plan.json", plan: fernhollowStudioPlan(), analysis: { source: "back", spectrumId: "machinery-hum", receiver: "record" } },
    { file: "cinema-under-nursery.plan.json", plan: cinemaUnderNurseryPlan(), analysis: { source: "cinema", spectrumId: "cinema-bass", receiver: "nursery" } },
  ];
}
