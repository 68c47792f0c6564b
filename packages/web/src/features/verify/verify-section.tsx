import { useState } from "react";
import { Badge } from "../../components/ui/badge";
import { Button } from "../../components/ui/button";
import { Card, CardHeader } from "../../components/ui/card";
import { EmptyState } from "../../components/ui/empty-state";
import { ErrorState } from "../../components/ui/error-state";
import { PageLoading } from "../../components/ui/spinner";
import { isApiError } from "../../lib/api-client";
import { formatDateTime } from "../../lib/format";
import { useCurrentMe } from "../auth/components/use-current-me";
import { levelWords } from "../price-book/components/money";
import { useProjectProposals } from "../proposals/api/proposals";
import { useMeasurements } from "../measurements/api/measurements";
import type { Measurement } from "@hushmark/schemas";
import { reportUrl, useAddVerification, useVerifications } from "./api/verifications";
import { OctaveComparison } from "./octave-comparison";

/** Parses 21 band levels typed or pasted with commas, spaces or new lines. */
export function parseBands(text: string): number[] | string {
  const values = text.split(/[\s,;]+/).filter(Boolean).map(Number);
  if (values.some((v) => !Number.isFinite(v))) return "Use numbers only, separated by commas or spaces.";
  if (values.length !== 21) return `Give 21 one-third-octave levels from 50 to 5000 Hz (you gave ${values.length}).`;
  return values;
}

/** Measurements with a level in every one of the 21 bands, which can stand for before or after. */
export function fullSpectra(measurements: readonly Measurement[]): { id: string; label: string; kind: Measurement["kind"]; levels: number[] }[] {
  return measurements.flatMap((m) => {
    if (m.status !== "ready" || m.leqDb.length !== 21 || m.leqDb.some((v) => v === null)) return [];
    const when = formatDateTime(m.takenAt);
    const laeq = m.summary?.laeqDb;
    return [{ id: m.id, kind: m.kind, label: `${m.label} · ${when}${laeq != null ? ` · ${laeq.toFixed(1)} dBA` : ""}`, levels: m.leqDb as number[] }];
  });
}

/** Verify: measured before and after the work against the prediction and the target, with the closing report. */
export default function VerifySection({ projectId }: { projectId: string }) {
  const me = useCurrentMe();
  const list = useVerifications(projectId);
  const proposals = useProjectProposals(projectId);
  const canRecord = me.membership.role === "owner" || me.membership.role === "surveyor";
  if (list.isPending) return <PageLoading label="Opening Verify" />;
  if (list.isError) return <ErrorState title="The verifications did not load" error={list.error} onRetry={() => void list.refetch()} />;
  const ready = (proposals.data?.proposals ?? []).filter((p) => ["deposit_paid", "in_progress", "verified"].includes(p.status));
  return (
    <div className="flex flex-col gap-5">
      {list.data.verifications.length === 0 ? (
        <EmptyState title="No after-work measurement yet">
          {!canRecord
            ? "The comparison of before and after appears here once the work is done and measured."
            : ready.length
              ? "Record it below: the band levels in the quiet room before and after the work."
              : "It can be recorded once a proposal's deposit is paid."}
        </EmptyState>
      ) : null}
      {list.data.verifications.map((v) => (
        <Card key={v.id}>
          <CardHeader title={`Measured ${formatDateTime(v.createdAt)}`} actions={v.target ? <Badge tone={v.target.met ? "good" : "caution"}>{v.target.met ? "Target met" : "Target not met yet"}</Badge> : null} />
          <div className="flex flex-col gap-3 p-5 text-sm">
            <p className="text-[15px]">{v.summary}</p>
            <dl className="grid grid-cols-2 gap-2 tabular-nums sm:grid-cols-4">
              <div><dt className="text-muted">Before</dt><dd><strong>{v.before.dba} dBA</strong> (NC {v.before.nc}) — {levelWords(v.before.dba)}</dd></div>
              <div><dt className="text-muted">After</dt><dd><strong>{v.after.dba} dBA</strong> (NC {v.after.nc}) — {levelWords(v.after.dba)}</dd></div>
              <div><dt className="text-muted">Predicted drop</dt><dd>{v.predictedGainDb} dB</dd></div>
              <div><dt className="text-muted">Measured drop</dt><dd>{v.measuredGainDb} dB</dd></div>
            </dl>
            <OctaveComparison v={v} />
            {v.note ? <p>{v.note}</p> : null}
            <a className="min-h-11 content-center font-medium text-brand underline" href={reportUrl(projectId, v.id)} download>Download the closing report (PDF)</a>
          </div>
        </Card>
      ))}
      {canRecord && (ready.length || list.data.verifications.length) ? <RecordForm projectId={projectId} proposals={ready} /> : null}
    </div>
  );
}

function RecordForm({ projectId, proposals }: { projectId: string; proposals: { id: string; title: string }[] }) {
  const [proposalId, setProposalId] = useState(proposals[0]?.id ?? "");
  const [before, setBefore] = useState("");
  const [after, setAfter] = useState("");
  const [note, setNote] = useState("");
  const [error, setError] = useState<string | null>(null);
  const add = useAddVerification(projectId);
  const spectra = fullSpectra(useMeasurements(projectId).data ?? []);
  if (proposals.length === 0) return <p className="text-sm text-muted">Record the after-work measurement once a proposal's deposit is paid.</p>;
  const submit = () => {
    const b = parseBands(before), a = parseBands(after);
    if (typeof b === "string") return setError(`Before: ${b}`);
    if (typeof a === "string") return setError(`After: ${a}`);
    setError(null);
    add.mutate({ proposalId: proposalId || proposals[0]!.id, beforeLevelsDb: b, afterLevelsDb: a, note }, { onSuccess: () => { setBefore(""); setAfter(""); setNote(""); }, onError: (e) => setError(isApiError(e) ? e.message : "Not saved.") });
  };
  return (
    <Card>
      <CardHeader title="Record the after-work measurement" description="Band levels (dB, 50 to 5000 Hz) at the quiet room with the same source running, before and after the work: pick a measurement from Measure, or type or paste 21 levels." />
      <div className="flex flex-col gap-3 p-5">
        <label className="flex max-w-md flex-col gap-1 text-sm font-medium">Proposal
          <select className="min-h-11 rounded-md border border-rule bg-panel px-3" value={proposalId} onChange={(e) => setProposalId(e.target.value)}>{proposals.map((p) => <option key={p.id} value={p.id}>{p.title}</option>)}</select>
        </label>
        <BandsField label="Before" value={before} onChange={setBefore} spectra={first(spectra, ["before_work", "receiver_side"])} />
        <BandsField label="After" value={after} onChange={setAfter} spectra={first(spectra, ["after_work"])} />
        <label className="flex flex-col gap-1 text-sm font-medium">Note
          <textarea className="min-h-16 rounded-md border border-rule bg-panel p-3 text-[15px]" value={note} onChange={(e) => setNote(e.target.value)} />
        </label>
        {error ? <p role="alert" className="text-sm font-medium text-danger">{error}</p> : null}
        <div><Button pending={add.isPending} onClick={submit}>Compare and save</Button></div>
      </div>
    </Card>
  );
}

/** The measurements of the kinds that usually stand for this side first, the rest after them. */
const first = <T extends { kind: string }>(list: T[], kinds: string[]) => [...list.filter((m) => kinds.includes(m.kind)), ...list.filter((m) => !kinds.includes(m.kind))];

/** 21 band levels, typed or pasted, or filled in from one of the project's measurements. */
export function BandsField({ label, value, onChange, spectra }: { label: string; value: string; onChange: (v: string) => void; spectra: { id: string; label: string; levels: number[] }[] }) {
  const [picked, setPicked] = useState("");
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-sm font-medium">{label} (21 levels)</legend>
      {spectra.length ? (
        <label className="flex max-w-xl flex-col gap-1 text-sm">
          <span className="text-muted">From a measurement</span>
          <select aria-label={`${label}: from a measurement`} className="min-h-11 rounded-md border border-rule bg-panel px-3" value={picked} onChange={(e) => {
            setPicked(e.target.value);
            const m = spectra.find((x) => x.id === e.target.value);
            if (m) onChange(m.levels.map((v) => v.toFixed(1)).join(" "));
          }}>
            <option value="">Type or paste below</option>
            {spectra.map((m) => <option key={m.id} value={m.id}>{m.label}</option>)}
          </select>
        </label>
      ) : null}
      <textarea aria-label={`${label} (21 levels)`} className="min-h-16 rounded-md border border-rule bg-panel p-3 font-mono text-sm" value={value} onChange={(e) => { setPicked(""); onChange(e.target.value); }} />
    </fieldset>
  );
}
