import type { Proposal } from "@hushmark/schemas";
import { formatMoney, levelWords } from "../../price-book/components/money";
import { ProposalPlan } from "./proposal-plan";

/** What the client reads: the expected improvement in plain words, the marked-up plan, the price, the cautions. */
export function ProposalBody({ proposal, document }: { proposal: Proposal; document: Record<string, unknown> | null }) {
  const c = proposal.content;
  const ev = c.evaluation;
  const money = (v: number) => formatMoney(v, c.currency);
  const marked = [...new Set(ev.lines.map((l) => l.elementId))];
  return (
    <div className="flex flex-col gap-5">
      <section aria-labelledby="expect">
        <h3 id="expect" className="mb-1 text-base font-semibold">What you can expect</h3>
        <p className="text-[15px]" data-testid="prediction">{c.predicted.summary}</p>
        <div className="mt-2 grid gap-2 sm:grid-cols-2">
          <p className="rounded-md border border-rule p-3 text-sm"><span className="block text-muted">Now</span><strong className="tabular-nums">{ev.before.dba.toFixed(0)} dBA</strong> — {levelWords(ev.before.dba)}</p>
          <p className="rounded-md border border-good/40 bg-good/5 p-3 text-sm"><span className="block text-muted">After the work</span><strong className="tabular-nums">{ev.after.dba.toFixed(0)} dBA</strong> — {levelWords(ev.after.dba)}</p>
        </div>
        <p className="mt-2 text-sm text-muted">{c.predicted.basis}</p>
      </section>
      {document ? (
        <section aria-labelledby="plan-h">
          <h3 id="plan-h" className="mb-1 text-base font-semibold">Where the work goes</h3>
          <ProposalPlan content={c} document={document} />
          <ol className="mt-2 list-decimal pl-5 text-sm">
            {marked.map((id) => <li key={id}>{ev.lines.find((l) => l.elementId === id)?.elementName}: {ev.lines.filter((l) => l.elementId === id).map((l) => l.name).join(", ")}</li>)}
          </ol>
        </section>
      ) : null}
      <section aria-labelledby="price-h">
        <h3 id="price-h" className="mb-1 text-base font-semibold">Scope and price</h3>
        <div className="overflow-x-auto">
          <table className="w-full min-w-[480px] text-sm tabular-nums">
            <thead><tr className="border-b border-rule text-left text-muted"><th className="py-1 font-medium">Item</th><th className="font-medium">Where</th><th className="font-medium">Quantity</th><th className="text-right font-medium">Amount</th></tr></thead>
            <tbody>
              {c.lines.map((l, i) => (
                <tr key={i} className="border-b border-rule/60"><td className="py-1.5 pr-2">{l.description}</td><td className="pr-2">{l.element}</td><td>{l.quantity} {l.unit}</td><td className="text-right">{money(l.amount)}</td></tr>
              ))}
            </tbody>
            <tfoot>
              <tr><td colSpan={3} className="pt-2 text-right">Subtotal</td><td className="pt-2 pl-4 text-right">{money(c.subtotal)}</td></tr>
              <tr><td colSpan={3} className="text-right">Tax ({c.taxRatePercent}%)</td><td className="pl-4 text-right">{money(c.tax)}</td></tr>
              <tr className="font-semibold"><td colSpan={3} className="text-right">Total</td><td className="pl-4 text-right" data-testid="total">{money(c.total)}</td></tr>
              <tr><td colSpan={3} className="text-right">Deposit on approval ({c.depositPercent}%)</td><td className="pl-4 text-right" data-testid="deposit">{money(c.deposit)}</td></tr>
            </tfoot>
          </table>
        </div>
        <p className="mt-1 text-sm text-muted">Valid until {c.validUntil}.{c.terms ? ` ${c.terms}` : ""}</p>
      </section>
      {c.cautions.length ? (
        <section aria-labelledby="caution-h" className="rounded-md border border-caution/40 bg-caution/5 p-4">
          <h3 id="caution-h" className="mb-1 text-base font-semibold">Safety cautions that apply</h3>
          <ul className="list-disc pl-5 text-sm">{c.cautions.map((k, i) => <li key={i}>{k.text}</li>)}</ul>
        </section>
      ) : null}
      <p className="text-sm text-muted">{c.disclaimer}</p>
    </div>
  );
}
