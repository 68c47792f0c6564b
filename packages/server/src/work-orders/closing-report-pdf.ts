import { ncCurveDb, spectrum, thirdOctaveToOctave } from "@hushmark/acoustics";
import { targetText, type ProposalContent, type Verification } from "@hushmark/schemas";
import type PDFDocument from "pdfkit";
import { levelPhrase } from "../proposals/plain-language.js";
import { heading, para, pdfBuffer, pdfText } from "../proposals/proposal-pdf.js";

type Doc = InstanceType<typeof PDFDocument>;

const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000];
const octaves = (thirds: readonly number[]) => (thirds.length === 21 ? thirdOctaveToOctave(spectrum("third-octave", thirds)).values.slice(0, 7) : null);

interface Series { label: string; colour: string; dash?: boolean; values: readonly number[] }

/**
 * Octave-band levels 63 Hz–4 kHz as lines on a chart, with a table of the same figures under it
 * (the chart is never alone). Octave bands because the NC rating is judged on them.
 */
function octaveChart(doc: Doc, series: readonly Series[], box: { x: number; y: number; width: number; height: number }): void {
  const all = series.flatMap((s) => s.values).filter(Number.isFinite);
  const top = Math.ceil((Math.max(40, ...all) + 5) / 10) * 10;
  const bottom = Math.max(0, Math.floor((Math.min(...all) - 5) / 10) * 10);
  const left = box.x + 26, right = box.x + box.width - 120, plotTop = box.y + 6, plotBottom = box.y + box.height - 16;
  const fx = (i: number) => left + (i / (OCTAVES_HZ.length - 1)) * (right - left);
  const fy = (db: number) => plotTop + ((top - db) / (top - bottom)) * (plotBottom - plotTop);
  doc.save().font("Helvetica").fontSize(7);
  for (let d = bottom; d <= top; d += 10) {
    doc.moveTo(left, fy(d)).lineTo(right, fy(d)).lineWidth(0.4).strokeColor("#d9d4c7").stroke();
    doc.fillColor("#6b7080").text(String(d), box.x, fy(d) - 3, { width: 22, align: "right", lineBreak: false });
  }
  OCTAVES_HZ.forEach((hz, i) => doc.fillColor("#6b7080").text(hz >= 1000 ? `${hz / 1000}k` : String(hz), fx(i) - 12, plotBottom + 4, { width: 24, align: "center", lineBreak: false }));
  doc.fillColor("#6b7080").text("dB", box.x, plotTop - 10, { lineBreak: false }).text("Hz, octave bands", right + 10, plotBottom + 4, { width: 100, lineBreak: false });
  series.forEach((s, k) => {
    const pts = s.values.map((v, i) => [fx(i), fy(Math.max(v, bottom))] as [number, number]);
    doc.lineWidth(s.dash ? 1.4 : 1.8).strokeColor(s.colour);
    if (s.dash) doc.dash(4, { space: 3 }); else doc.undash();
    doc.moveTo(...pts[0]!);
    for (const p of pts.slice(1)) doc.lineTo(...p);
    doc.stroke().undash();
    if (!s.dash) for (const p of pts) doc.circle(...p, 1.8).fill(s.colour);
    // The key, right of the plot.
    const ky = plotTop + 4 + k * 14;
    doc.lineWidth(1.8).strokeColor(s.colour);
    if (s.dash) doc.dash(4, { space: 3 });
    doc.moveTo(right + 10, ky + 3).lineTo(right + 28, ky + 3).stroke().undash();
    doc.fillColor("#1d2433").text(pdfText(s.label), right + 32, ky, { width: 88, lineBreak: false });
  });
  doc.restore();
  // The figures, one row per series.
  doc.font("Helvetica").fontSize(7.5).fillColor("#1d2433");
  let y = box.y + box.height + 6;
  const col = (i: number) => box.x + 110 + i * 42;
  doc.font("Helvetica-Bold").text("Octave, Hz", box.x, y, { lineBreak: false });
  OCTAVES_HZ.forEach((hz, i) => doc.text(String(hz), col(i), y, { width: 36, align: "right", lineBreak: false }));
  doc.font("Helvetica");
  for (const s of series) {
    y += 11;
    doc.text(pdfText(s.label), box.x, y, { width: 108, lineBreak: false });
    s.values.forEach((v, i) => doc.text(v.toFixed(1), col(i), y, { width: 36, align: "right", lineBreak: false }));
  }
  doc.x = box.x;
  doc.y = y + 16;
}

/** The closing report for the client: measured before and after, the prediction and the target. */
export function renderClosingReport(v: Verification, content: ProposalContent): Promise<Buffer> {
  return pdfBuffer((doc) => {
    const left = doc.page.margins.left;
    const width = doc.page.width - left - doc.page.margins.right;
    doc.font("Helvetica").fontSize(9).fillColor("#6b7080").text(pdfText(`${content.firmName} · Closing report · ${v.createdAt.slice(0, 10)}`));
    doc.moveDown(0.3).font("Helvetica-Bold").fontSize(18).fillColor("#1d2433").text(pdfText(`After the work: ${content.projectTitle}`));
    if (content.siteAddress) para(doc, content.siteAddress, "#6b7080");
    heading(doc, "What we measured");
    para(doc, v.summary);
    para(doc, `Before the work: ${v.before.dba} dBA (NC ${v.before.nc}) — ${levelPhrase(v.before.dba)}.`);
    para(doc, `After the work: ${v.after.dba} dBA (NC ${v.after.nc}) — ${levelPhrase(v.after.dba)}.`);
    heading(doc, "Against the prediction");
    para(doc, `Predicted: from ${v.predicted.beforeDba} to ${v.predicted.afterDba} dBA, a drop of ${v.predictedGainDb} dB. Measured drop: ${v.measuredGainDb} dB.`);
    if (v.target) para(doc, `Target (${targetText(v.target)}): ${v.target.met ? "met" : "not met yet"}.`);

    const before = octaves(v.bands.beforeDb);
    const after = octaves(v.bands.afterDb);
    const predicted = octaves(v.bands.predictedAfterDb);
    if (before && after) {
      heading(doc, `By frequency, in ${content.evaluation.receiver.name}`, 11);
      const series: Series[] = [
        { label: "Measured before", colour: "#6b7080", values: before },
        { label: "Measured after", colour: "#1f7a74", values: after },
        ...(predicted ? [{ label: "Predicted after", colour: "#1f7a74", dash: true, values: predicted }] : []),
        ...(v.target?.kind === "nc" ? [{ label: `NC ${v.target.value} target`, colour: "#c2412d", dash: true, values: ncCurveDb(v.target.value).slice(0, 7) }] : []),
      ];
      octaveChart(doc, series, { x: left, y: doc.y + 14, width, height: 170 });
    }
    if (v.note) {
      heading(doc, "Notes");
      para(doc, v.note);
    }
    heading(doc, "Work done", 11);
    for (const l of content.evaluation.lines) para(doc, `• ${l.name} — ${l.elementName}`);
    para(doc, "Measured levels are A-weighted at the receiving room with the same source running before and after; the measurement has an uncertainty of a few decibels. Octave-band levels are energy sums of the measured one-third-octave bands.", "#6b7080");
  }, `Closing report — ${content.projectTitle}`);
}
