/**
 * The marked-up plan of one analysis as a one-page PDF for print: title block, the receiver's
 * level on a plan coloured by each element's share, the legend, the weakest paths and the basis.
 * Vectors drawn from the plan model (the same drawing as the proposal's), not a screenshot.
 */
import { targetText, type AnalysisResult } from "@hushmark/schemas";
import { sharePercent } from "@hushmark/floorplan";
import { drawLegend, drawPlan } from "../proposals/plan-drawing.js";
import { heading, para, pdfBuffer, pdfText } from "../proposals/proposal-pdf.js";
import type { PreparedNetwork } from "./compute.js";

export interface AnalysisPdfInput {
  projectTitle: string;
  siteAddress: string | null;
  firmName: string;
  /** When it was drawn, as the reader should see it (the caller formats it). */
  drawnOn: string;
  result: AnalysisResult;
  prepared: Extract<PreparedNetwork, { ok: true }>;
}

const round1 = (v: number) => (Math.round(v * 10) / 10).toFixed(1);

export function renderAnalysisPdf(input: AnalysisPdfInput): Promise<Buffer> {
  const { result: r } = input;
  const title = `Sound paths: ${r.source.name} to ${r.receiver.name}`;
  return pdfBuffer((doc) => {
    const left = doc.page.margins.left;
    const width = doc.page.width - left - doc.page.margins.right;
    doc.font("Helvetica").fontSize(9).fillColor("#6b7080").text(pdfText(`${input.firmName} · plan version ${r.planVersion} · drawn ${input.drawnOn}`));
    doc.moveDown(0.3).font("Helvetica-Bold").fontSize(16).fillColor("#1d2433").text(pdfText(title));
    para(doc, `${input.projectTitle}${input.siteAddress ? ` — ${input.siteAddress}` : ""}`, "#6b7080");
    const target = r.target ? ` ${r.target.met ? `Meets the target of ${targetText(r.target)}` : `Misses the target of ${targetText(r.target)} by ${round1(r.target.shortfallDb)} dB`}.` : "";
    para(doc, `Received in ${r.receiver.name}: about ${round1(r.receiver.dba)} dBA${r.receiver.nc !== null ? `, NC ${r.receiver.nc}` : ""}, from ${round1(r.source.dba)} dBA in ${r.source.name}.${target}`);

    const top = doc.y + 6;
    const shares = new Map(r.elements.map((e) => [e.elementId, e.share]));
    drawPlan(doc, input.prepared, r.receiver.id, shares, new Map(), { x: left, y: top, width, height: 380 }, r.paths.slice(0, 3));
    drawLegend(doc, left, top + 388);
    doc.x = left;
    doc.y = top + 420;

    heading(doc, "The weakest paths");
    for (const p of r.paths.slice(0, 5)) para(doc, `${p.label}: ${sharePercent(p.share)} of the sound, about ${round1(p.dba)} dBA`);
    heading(doc, "Basis", 11);
    para(doc, "Predicted by Hushmark's sound-transmission model from the surveyed plan and its constructions, band by band from 50 to 5000 Hz; levels are A-weighted at the receiving room. Predictions are estimates, not measurements.", "#6b7080");
  }, title);
}
