import { targetText, type AnalysisResult } from "@hushmark/schemas";
import { levelInWords, shortfallInWords } from "../model/plain-language";

/** The headline: what reaches the receiver, as figures for staff and in words for the client. */
export function ResultSummary({ result, plain }: { result: AnalysisResult; plain: boolean }) {
  const { receiver, target, source } = result;
  return (
    <section aria-label="Level in the room" className="flex flex-col gap-1">
      <p className="text-[13px] text-muted">{source.name} → {receiver.name}</p>
      <p className="flex flex-wrap items-baseline gap-x-3">
        <span className="numeric text-3xl font-semibold tracking-tight" data-testid="received-dba">{receiver.dba.toFixed(1)} dBA</span>
        {receiver.nc !== null ? <span className="numeric text-lg font-medium text-muted">NC {Math.round(receiver.nc)}</span> : null}
      </p>
      <p className="text-[14px]">Heard in the room: {levelInWords(receiver.dba)}.</p>
      {target ? (
        <p className={`rounded-md px-2 py-1 text-[14px] font-medium ${target.met ? "bg-good/10 text-good" : "bg-danger/10 text-danger"}`} data-testid="target-state">
          {target.met
            ? `Meets the target of ${targetText(target)}.`
            : plain
              ? `Target ${targetText(target)}: ${shortfallInWords(target.shortfallDb)}.`
              : `Misses the target of ${targetText(target)} by ${target.shortfallDb.toFixed(1)} dB.`}
        </p>
      ) : null}
    </section>
  );
}

export function PathsList({ result, highlight, onHighlight }: { result: AnalysisResult; highlight: number | null; onHighlight: (rank: number | null) => void }) {
  return (
    <section aria-labelledby="paths-title">
      <h3 id="paths-title" className="text-[15px] font-semibold">Weakest paths</h3>
      <ol className="mt-1 flex flex-col gap-1">
        {result.paths.slice(0, 5).map((p) => (
          <li key={p.rank}>
            <button type="button" aria-pressed={highlight === p.rank} onClick={() => onHighlight(highlight === p.rank ? null : p.rank)} className={`flex min-h-11 w-full items-start gap-2 rounded-md px-2 py-1.5 text-left text-[14px] hover:bg-ink/5 ${highlight === p.rank ? "bg-brand-soft" : ""}`}>
              <span className="numeric mt-0.5 inline-flex h-5 w-5 shrink-0 items-center justify-center rounded-full bg-ink text-[11px] font-semibold text-white">{p.rank}</span>
              <span className="min-w-0 flex-1">
                <span className="block">{p.label}</span>
                <span className="numeric block text-[12px] text-muted">{p.dba.toFixed(1)} dBA · {Math.round(p.share * 100)} % of the total</span>
              </span>
            </button>
          </li>
        ))}
      </ol>
    </section>
  );
}
