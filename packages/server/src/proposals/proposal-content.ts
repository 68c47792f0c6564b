import type { FirmSettings, ProposalContent, ProposalLine, ScenarioEvaluation } from "@hushmark/schemas";
import { cents } from "../money/decimal.js";
import { DISCLAIMER, improvementSummary, PREDICTION_BASIS } from "./plain-language.js";

export interface ContentInput {
  title: string;
  note: string;
  project: { title: string; siteAddress: string };
  firmName: string;
  settings: FirmSettings;
  evaluation: ScenarioEvaluation;
  planVersion: number;
  /** Date the proposal is valid until (YYYY-MM-DD); default: today + the firm's validity days. */
  validUntil?: string;
  today: Date;
}

/** The frozen content of a proposal version: line items, totals, tax, deposit, prediction in plain words. */
export function proposalContent(input: ContentInput): ProposalContent {
  const { evaluation: ev, settings } = input;
  const lines: ProposalLine[] = ev.lines.flatMap((l) => {
    const out: ProposalLine[] = [];
    const quantity = l.areaM2 >= 0.5 ? Math.round(l.areaM2 * 10) / 10 : 1;
    const unit = l.areaM2 >= 0.5 ? "m²" : "item";
    if (l.materials > 0) out.push({ description: `${l.name} — materials`, element: l.elementName, kind: "materials", quantity, unit, amount: l.materials });
    if (l.labour > 0) out.push({ description: `${l.name} — labour (${l.labourHours} h)`, element: l.elementName, kind: "labour", quantity: l.labourHours, unit: "h", amount: l.labour });
    return out;
  });
  const subtotal = cents(lines.reduce((s, l) => s + l.amount, 0));
  const tax = cents((subtotal * settings.taxRatePercent) / 100);
  const total = cents(subtotal + tax);
  const deposit = cents((total * settings.depositPercent) / 100);
  const valid = input.validUntil ?? new Date(input.today.getTime() + settings.validityDays * 86_400_000).toISOString().slice(0, 10);
  const words = improvementSummary(ev.receiver.name, ev.source.name, ev.source.dba, ev.before.dba, ev.after.dba);
  const targetWords = ev.target ? (ev.target.met ? " The target is predicted to be met." : ` The target is predicted to be missed by about ${ev.target.shortfallDb.toFixed(1)} dB.`) : "";
  return {
    title: input.title,
    note: input.note,
    projectTitle: input.project.title,
    siteAddress: input.project.siteAddress,
    firmName: input.firmName,
    currency: settings.currency,
    lines,
    subtotal,
    taxRatePercent: settings.taxRatePercent,
    tax,
    total,
    depositPercent: settings.depositPercent,
    deposit,
    terms: settings.terms,
    validUntil: valid,
    predicted: { before: words.before, after: words.after, basis: PREDICTION_BASIS, summary: `${words.summary}${targetWords}` },
    evaluation: ev,
    cautions: ev.cautions,
    disclaimer: DISCLAIMER,
    planVersion: input.planVersion,
  };
}

/** Money as the client reads it, in the firm's currency. */
export function formatMoney(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat("en-US", { style: "currency", currency }).format(amount);
  } catch {
    return `${amount.toFixed(2)} ${currency}`;
  }
}
