import type { Proposal } from "@hushmark/schemas";
import { useEffect, useState } from "react";
import { useSearchParams } from "react-router-dom";
import { Badge } from "../../components/ui/badge";
import { Button, ButtonLink } from "../../components/ui/button";
import { Card, CardHeader } from "../../components/ui/card";
import { EmptyState } from "../../components/ui/empty-state";
import { ErrorState } from "../../components/ui/error-state";
import { PageLoading } from "../../components/ui/spinner";
import { paths } from "../../config/paths";
import { isApiError } from "../../lib/api-client";
import { formatDateTime } from "../../lib/format";
import { useCurrentMe } from "../auth/components/use-current-me";
import { formatMoney } from "../price-book/components/money";
import { usePlan } from "../projects/api/get-plan";
import { pdfUrl, useProjectProposals, useProposal, useSendProposal, useUpdateProposal } from "./api/proposals";
import { ClientDecision } from "./components/client-decision";
import { Comments } from "./components/comments";
import { ProposalBody } from "./components/proposal-body";
import { STATUS_ORDER, statusWords } from "./components/proposal-words";

/** Proposal: the firm drafts, sends and revises; the client reads, comments, decides and pays. */
export default function ProposalSection({ projectId }: { projectId: string }) {
  const me = useCurrentMe();
  const list = useProjectProposals(projectId);
  const [params, setParams] = useSearchParams();
  const wanted = params.get("id");
  const chosen = wanted ?? list.data?.proposals[0]?.id ?? null;
  const proposal = useProposal(chosen);
  const plan = usePlan(projectId);
  const isClient = me.membership.role === "client";
  if (list.isPending) return <PageLoading label="Opening the proposal" />;
  if (list.isError) return <ErrorState title="The proposals did not load" error={list.error} onRetry={() => void list.refetch()} />;
  if (!chosen) {
    return (
      <EmptyState title={isClient ? "No proposal yet" : "No proposal yet"}>
        {isClient ? "Your contractor has not sent a proposal for this project yet." : "Make one from a scenario in Options."}
        {!isClient ? <div className="mt-3"><ButtonLink to={paths.projectSection(projectId, "options")}>Go to Options</ButtonLink></div> : null}
      </EmptyState>
    );
  }
  if (proposal.isPending) return <PageLoading label="Opening the proposal" />;
  if (proposal.isError) return <ErrorState title="The proposal did not load" error={proposal.error} onRetry={() => void proposal.refetch()} />;
  const p = proposal.data;
  return (
    <div className="flex flex-col gap-5">
      {params.get("payment") === "done" ? <p role="status" className="rounded-md border border-good/40 bg-good/5 p-3 text-sm">Thank you — the payment went through. The deposit shows as paid once the payment service confirms it.</p> : null}
      {params.get("payment") === "cancelled" ? <p role="status" className="rounded-md border border-rule p-3 text-sm">You left the payment page without paying. Nothing was charged.</p> : null}
      {list.data.proposals.length > 1 ? (
        <label className="flex max-w-md flex-col gap-1 text-sm font-medium">
          Proposal
          <select className="min-h-11 rounded-md border border-rule bg-panel px-3" value={p.id} onChange={(e) => setParams({ id: e.target.value })}>
            {list.data.proposals.map((x) => <option key={x.id} value={x.id}>{x.title} — {statusWords[x.status].label}</option>)}
          </select>
        </label>
      ) : null}
      <Card>
        <CardHeader title={p.content.title} description={<>Version {p.currentVersion} · {formatMoney(p.content.total, p.content.currency)} · valid until {p.content.validUntil}</>} actions={<Badge tone={statusWords[p.status].tone}>{statusWords[p.status].label}</Badge>} />
        <StateLine status={p.status} />
        <div className="p-5">
          <ProposalBody proposal={p} document={Object.keys(p.planDocument).length ? p.planDocument : plan.data?.version ? plan.data.document : null} />
        </div>
      </Card>
      <div className="grid gap-5 lg:grid-cols-2">
        <Card>
          <CardHeader title={isClient ? "Your decision" : "Send and revise"} />
          <div className="p-5">{isClient ? <ClientDecision proposal={p} projectId={projectId} /> : <StaffActions proposal={p} projectId={projectId} />}</div>
        </Card>
        <Card>
          <CardHeader title="Versions" />
          <ul className="divide-y divide-rule px-5 py-2 text-sm">
            {p.versions.map((v) => (
              <li key={v.version} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span>Version {v.version} · {v.sentAt ? `sent ${formatDateTime(v.sentAt)}` : "not sent"}</span>
                {v.pdf === "ready" ? <a className="min-h-11 content-center font-medium text-brand underline" href={pdfUrl(p.id, v.version)} download>Download PDF</a> : <span className="text-muted">{v.pdf === "pending" ? "PDF being made…" : "PDF failed"}</span>}
              </li>
            ))}
          </ul>
          {p.payments.length ? (
            <div className="border-t border-rule px-5 py-3 text-sm">
              <p className="font-medium">Payments</p>
              <ul>{p.payments.map((x) => <li key={x.id}>{formatMoney(x.amount, x.currency)} — {x.status === "paid" ? `paid ${x.paidAt ? formatDateTime(x.paidAt) : ""}` : x.status === "failed" ? `failed: ${x.failureMessage ?? ""}` : "waiting"}</li>)}</ul>
            </div>
          ) : null}
        </Card>
      </div>
      <Card>
        <CardHeader title="Comments" />
        <div className="p-5"><Comments proposal={p} projectId={projectId} /></div>
      </Card>
    </div>
  );
}

function StateLine({ status }: { status: Proposal["status"] }) {
  const at = status === "changes_asked" ? 1 : STATUS_ORDER.indexOf(status);
  return (
    <ol className="flex flex-wrap gap-x-1 gap-y-1 border-b border-rule px-5 py-2 text-[13px]" aria-label="Proposal state">
      {STATUS_ORDER.map((s, i) => (
        <li key={s} className={`flex items-center gap-1 ${i <= at ? "text-ink" : "text-muted"}`} aria-current={i === at ? "step" : undefined}>
          <span className={`inline-block size-2 rounded-full ${i <= at ? "bg-brand" : "bg-rule"}`} />
          {s === "sent" && status === "changes_asked" ? "Changes asked" : statusWords[s].label}
          {i < STATUS_ORDER.length - 1 ? <span className="px-1 text-muted">→</span> : null}
        </li>
      ))}
    </ol>
  );
}

function StaffActions({ proposal, projectId }: { proposal: Proposal; projectId: string }) {
  const [note, setNote] = useState(proposal.content.note);
  const [validUntil, setValidUntil] = useState(proposal.content.validUntil);
  const [error, setError] = useState<string | null>(null);
  const me = useCurrentMe();
  const send = useSendProposal(projectId, proposal.id);
  const update = useUpdateProposal(projectId, proposal.id);
  useEffect(() => {
    setNote(proposal.content.note);
    setValidUntil(proposal.content.validUntil);
  }, [proposal.currentVersion, proposal.content.note, proposal.content.validUntil]);
  const canEdit = (me.membership.role === "owner" || me.membership.role === "planner") && ["draft", "sent", "changes_asked"].includes(proposal.status);
  const sentThis = proposal.versions.find((v) => v.version === proposal.currentVersion)?.sentAt;
  const fail = (e: unknown) => setError(isApiError(e) ? e.message : "That did not go through.");
  if (!canEdit) return <p className="text-sm text-muted">{proposal.approvedAt ? `Approved by ${proposal.approvedBy} on ${formatDateTime(proposal.approvedAt)}.` : "This proposal can no longer change."}</p>;
  return (
    <div className="flex flex-col gap-3">
      <label className="flex flex-col gap-1 text-sm font-medium">
        Note to the client
        <textarea className="min-h-20 rounded-md border border-rule bg-panel p-3 text-[15px]" value={note} onChange={(e) => setNote(e.target.value)} maxLength={2000} />
      </label>
      <label className="flex max-w-xs flex-col gap-1 text-sm font-medium">
        Valid until
        <input type="date" className="min-h-11 rounded-md border border-rule bg-panel px-3" value={validUntil} onChange={(e) => setValidUntil(e.target.value)} />
      </label>
      {error ? <p role="alert" className="text-sm font-medium text-danger">{error}</p> : null}
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" pending={update.isPending} disabled={note === proposal.content.note && validUntil === proposal.content.validUntil} onClick={() => update.mutate({ note, validUntil }, { onError: fail })}>
          {sentThis ? "Save as a new version" : "Save changes"}
        </Button>
        <Button pending={send.isPending} disabled={Boolean(sentThis) || proposal.status !== "draft"} onClick={() => send.mutate(undefined, { onError: fail })}>
          Send version {proposal.currentVersion} to the client
        </Button>
      </div>
      {sentThis ? <p className="text-sm text-muted">Version {proposal.currentVersion} was sent {formatDateTime(sentThis)}. A change makes version {proposal.currentVersion + 1}.</p> : null}
    </div>
  );
}
