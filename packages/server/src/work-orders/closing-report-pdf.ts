import type { ProposalContent, Verification } from "@hushmark/schemas";
import { levelPhrase } from "../proposals/plain-language.js";
import { heading, para, pdfBuffer, pdfText } from "../proposals/proposal-pdf.js";

/** The closing report for the client: measured before and after, the prediction and the target. */
export function renderClosingReport(v: Verification, content: ProposalContent): Promise<Buffer> {
  return pdfBuffer((doc) => {
    doc.font("Helvetica").fontSize(9).fillColor("#6b7080").text(pdfText(`${content.firmName} · Closing report · ${v.createdAt.slice(0, 10)}`));
    doc.moveDown(0.3).font("Helvetica-Bold").fontSize(18).fillColor("#1d2433").text(pdfText(`After the work: ${content.projectTitle}`));
    heading(doc, "What we measured");
    para(doc, v.summary);
    para(doc, `Before the work: ${v.before.dba} dBA (NC ${v.before.nc}) — ${levelPhrase(v.before.dba)}.`);
    para(doc, `After the work: ${v.after.dba} dBA (NC ${v.after.nc}) — ${levelPhrase(v.after.dba)}.`);
    heading(doc, "Against the prediction");
    para(doc, `Predicted: from ${v.predicted.beforeDba} to ${v.predicted.afterDba} dBA, a drop of ${v.predictedGainDb} dB. Measured drop: ${v.measuredGainDb} dB.`);
    if (v.target) para(doc, `Target (${v.target.kind === "nc" ? `NC ${v.target.value}` : v.target.kind === "dba" ? `${v.target.value} dBA` : `${v.target.value} dB reduction`}): ${v.target.met ? "met" : "not met yet"}.`);
    if (v.note) {
      heading(doc, "Notes");
      para(doc, v.note);
    }
    heading(doc, "Work done", 11);
    for (const l of content.evaluation.lines) para(doc, `• ${l.name} — ${l.elementName}`);
    para(doc, "Measured levels are A-weighted at the receiving room with the same source running before and after; the measurement has an uncertainty of a few decibels.", "#6b7080");
  }, `Closing report — ${content.projectTitle}`);
}
