/**
 * The proposal as a PDF (pdfkit): the scope, line items, totals, the marked-up plan before and
 * after drawn from the plan model, the predicted improvement in plain words with its basis,
 * the cautions and the disclaimer.
 */
import PDFDocument from "pdfkit";
import type { ProposalContent } from "@hushmark/schemas";
import type { PreparedNetwork } from "../analyses/compute.js";
import { drawLegend, drawPlan } from "./plan-drawing.js";
import { formatMoney } from "./proposal-content.js";

type Doc = InstanceType<typeof PDFDocument>;

/** The built-in Helvetica speaks WinAnsi only: spell out the few signs outside it. */
export function pdfText(s: string): string {
  return s
    .replace(/≥/g, ">=")
    .replace(/≤/g, "<=")
    .replace(/³/g, "3")
    .replace(/[“”]/g, '"')
    .replace(/[‘’]/g, "'")
    .replace(/−/g, "-")
    .replace(/[^\x20-\x7e\n\u00a0-\u00ff—–…•]/g, "?");
}

export function pdfBuffer(draw: (doc: Doc) => void, title: string): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({ size: "A4", margin: 48, info: { Title: pdfText(title), Creator: "Hushmark" } });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    try {
      draw(doc);
      doc.end();
    } catch (e) {
      reject(e as Error);
    }
  });
}

export function heading(doc: Doc, text: string, size = 13): void {
  doc.moveDown(0.6).font("Helvetica-Bold").fontSize(size).fillColor("#1d2433").text(pdfText(text)).font("Helvetica").fontSize(10);
}

export function para(doc: Doc, text: string, colour = "#1d2433"): void {
  doc.font("Helvetica").fontSize(10).fillColor(colour).text(pdfText(text), { paragraphGap: 4 });
}

function ensureSpace(doc: Doc, height: number): void {
  if (doc.y + height > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

function lineTable(doc: Doc, c: ProposalContent): void {
  const left = doc.page.margins.left;
  const cols = [left, left + 230, left + 360, left + 420];
  const money = (v: number) => formatMoney(v, c.currency);
  doc.font("Helvetica-Bold").fontSize(9);
  const head = doc.y;
  ["Item", "Where", "Quantity", "Amount"].forEach((h, i) => doc.text(h, cols[i]!, head, { width: i === 3 ? 79 : cols[i + 1]! - cols[i]! - 6, align: i === 3 ? "right" : "left" }));
  doc.font("Helvetica").fontSize(9);
  for (const l of c.lines) {
    ensureSpace(doc, 28);
    const y = doc.y + 4;
    doc.text(pdfText(l.description), cols[0]!, y, { width: 224 });
    const h1 = doc.y;
    doc.text(pdfText(l.element), cols[1]!, y, { width: 124 });
    const h2 = doc.y;
    doc.text(`${l.quantity} ${pdfText(l.unit)}`, cols[2]!, y, { width: 54 });
    doc.text(money(l.amount), cols[3]!, y, { width: 79, align: "right" });
    doc.y = Math.max(h1, h2, doc.y);
  }
  ensureSpace(doc, 70);
  doc.moveDown(0.5);
  const row = (label: string, value: string, bold = false) => {
    const y = doc.y;
    doc.font(bold ? "Helvetica-Bold" : "Helvetica").text(label, cols[1]!, y, { width: 180 });
    doc.text(value, cols[3]!, y, { width: 79, align: "right" });
  };
  row("Subtotal", money(c.subtotal));
  row(`Tax (${c.taxRatePercent}%)`, money(c.tax));
  row("Total", money(c.total), true);
  row(`Deposit on approval (${c.depositPercent}%)`, money(c.deposit));
  doc.font("Helvetica").x = left;
}

export interface ProposalPdfInput {
  content: ProposalContent;
  version: number;
  prepared: Extract<PreparedNetwork, { ok: true }> | null;
  receiverId: string;
  sharesBefore: Map<string, number>;
  sharesAfter: Map<string, number>;
  markers: Map<string, number>;
}

/** Renders one proposal version to PDF bytes. */
export function renderProposalPdf(input: ProposalPdfInput): Promise<Buffer> {
  const c = input.content;
  return pdfBuffer((doc) => {
    doc.font("Helvetica").fontSize(9).fillColor("#6b7080").text(pdfText(`${c.firmName} · Proposal, version ${input.version} · valid until ${c.validUntil}`));
    doc.moveDown(0.3).font("Helvetica-Bold").fontSize(18).fillColor("#1d2433").text(pdfText(c.title));
    para(doc, `${c.projectTitle}${c.siteAddress ? ` — ${c.siteAddress}` : ""}`, "#6b7080");
    if (c.note) para(doc, c.note);

    heading(doc, "What you can expect");
    para(doc, c.predicted.summary);
    para(doc, `Now: ${c.predicted.before}. After the work: ${c.predicted.after}.`);
    para(doc, `Basis: ${c.predicted.basis}`, "#6b7080");

    if (input.prepared) {
      ensureSpace(doc, 250);
      heading(doc, "Where the sound gets through — now and after the work");
      const top = doc.y + 4;
      const w = (doc.page.width - doc.page.margins.left - doc.page.margins.right - 16) / 2;
      const left = doc.page.margins.left;
      doc.fontSize(8).fillColor("#6b7080").text("Now", left, top).text("After the work (numbers mark the upgrades)", left + w + 16, top);
      drawPlan(doc, input.prepared, input.receiverId, input.sharesBefore, new Map(), { x: left, y: top + 12, width: w, height: 190 });
      drawPlan(doc, input.prepared, input.receiverId, input.sharesAfter, input.markers, { x: left + w + 16, y: top + 12, width: w, height: 190 });
      drawLegend(doc, left, top + 208);
      doc.x = left;
      doc.y = top + 236;
    }

    heading(doc, "Scope and price");
    [...input.markers.entries()].forEach(([elementId, n]) => {
      const line = c.evaluation.lines.find((l) => l.elementId === elementId);
      if (line) para(doc, `${n}. ${line.elementName}: ${c.evaluation.lines.filter((l) => l.elementId === elementId).map((l) => l.name).join(", ")}`);
    });
    doc.moveDown(0.3);
    lineTable(doc, c);

    if (c.cautions.length > 0) {
      ensureSpace(doc, 80);
      heading(doc, "Safety cautions that apply");
      for (const k of c.cautions) para(doc, `• ${k.text}`);
    }
    if (c.terms) {
      heading(doc, "Terms");
      para(doc, c.terms);
    }
    heading(doc, "About the prediction", 11);
    para(doc, c.disclaimer, "#6b7080");
  }, c.title);
}
