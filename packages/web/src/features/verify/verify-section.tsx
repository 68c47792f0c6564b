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
import { reportUrl, useAddVerification, useVerifications } from "./api/verifications";

/** Parses 21 band levels typed or pasted with commas, spaces or new lines. */
export function parseBands(text: string): number[] | string {
  const values = text.split(/[\s,;]+/).filter(Boolean).map(Number);
  if (values.some((v) => !Number.isFinite(v))) return "Use numbers only, separated by commas or spaces.";
  if (values.length !== 21) return `Give 21 one-third-octave levels from 50 to 5000 Hz (you gave ${values.length}).`;
  return values;
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
      <CardHeader title="Record the after-work measurement" description="Band levels (dB, 50 to 5000 Hz) at the quiet room with the same source running, before and after the work." />
      <div className="flex flex-col gap-3 p-5">
        <label className="flex max-w-md flex-col gap-1 text-sm font-medium">Proposal
          <select className="min-h-11 rounded-md border border-rule bg-panel px-3" value={proposalId} onChange={(e) => setProposalId(e.target.value)}>{proposals.map((p) => <option key={p.id} value={p.id}>{p.title}</option>)}</select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">Before (21 levels)
          <textarea className="min-h-16 rounded-md border border-rule bg-panel p-3 font-mono text-sm" value={before} onChange={(e) => setBefore(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">After (21 levels)
          <textarea className="min-h-16 rounded-md border border-rule bg-panel p-3 font-mono text-sm" value={after} onChange={(e) => setAfter(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">Note
          <textarea className="min-h-16 rounded-md border border-rule bg-panel p-3 text-[15px]" value={note} onChange={(e) => setNote(e.target.value)} />
        </label>
        {error ? <p role="alert" className="text-sm font-medium text-danger">{error}</p> : null}
        <div><Button pending={add.isPending} onClick={submit}>Compare and save</Button></div>
      </div>
    </Card>
  );
}
