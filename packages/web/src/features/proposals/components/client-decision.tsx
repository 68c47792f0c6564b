import type { Proposal } from "@hushmark/schemas";
import { useState } from "react";
import { Button } from "../../../components/ui/button";
import { isApiError } from "../../../lib/api-client";
import { formatDateTime } from "../../../lib/format";
import { formatMoney } from "../../price-book/components/money";
import { startDeposit, useApproveProposal, useAskChanges } from "../api/proposals";

/** The client's part: approve or ask for changes, then pay the deposit through the payment page. */
export function ClientDecision({ proposal, projectId }: { proposal: Proposal; projectId: string }) {
  const [comment, setComment] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [paying, setPaying] = useState(false);
  const approve = useApproveProposal(projectId, proposal.id);
  const changes = useAskChanges(projectId, proposal.id);
  const c = proposal.content;
  const fail = (e: unknown) => setError(isApiError(e) ? e.message : "That did not go through. Try again.");
  const lastPayment = proposal.payments.at(-1);

  if (proposal.status === "sent") {
    return (
      <div className="flex flex-col gap-3">
        <label className="flex flex-col gap-1 text-sm font-medium">
          A note with your decision (needed when asking for changes)
          <textarea className="min-h-20 rounded-md border border-rule bg-panel p-3 text-[15px]" value={comment} onChange={(e) => setComment(e.target.value)} maxLength={4000} />
        </label>
        {error ? <p role="alert" className="text-sm font-medium text-danger">{error}</p> : null}
        <div className="flex flex-wrap gap-2">
          <Button pending={approve.isPending} onClick={() => approve.mutate({ version: proposal.currentVersion, comment }, { onError: fail })}>Approve version {proposal.currentVersion}</Button>
          <Button variant="secondary" pending={changes.isPending} disabled={!comment.trim()} onClick={() => changes.mutate({ version: proposal.currentVersion, comment }, { onError: fail })}>Ask for changes</Button>
        </div>
        <p className="text-sm text-muted">Approving asks for a deposit of {formatMoney(c.deposit, c.currency)} ({c.depositPercent}% of {formatMoney(c.total, c.currency)}).</p>
      </div>
    );
  }
  if (proposal.status === "approved") {
    return (
      <div className="flex flex-col gap-2">
        <p className="text-sm">You approved this on {proposal.approvedAt ? formatDateTime(proposal.approvedAt) : "—"}. The deposit is {formatMoney(c.deposit, c.currency)}.</p>
        {lastPayment?.status === "failed" ? <p role="alert" className="text-sm font-medium text-danger">The last payment did not go through: {lastPayment.failureMessage ?? "declined"}. You can try again.</p> : null}
        {lastPayment?.status === "pending" ? <p role="status" className="text-sm text-muted">Waiting for the payment to be confirmed…</p> : null}
        {error ? <p role="alert" className="text-sm font-medium text-danger">{error}</p> : null}
        <div>
          <Button pending={paying} onClick={() => {
            setPaying(true);
            setError(null);
            startDeposit(proposal.id, proposal.currentVersion).then((r) => window.location.assign(r.url)).catch((e: unknown) => { fail(e); setPaying(false); });
          }}>Pay the deposit of {formatMoney(c.deposit, c.currency)}</Button>
        </div>
      </div>
    );
  }
  if (proposal.status === "changes_asked") return <p className="text-sm">You asked for changes; the firm will send a new version.</p>;
  const paid = proposal.payments.find((p) => p.status === "paid");
  return <p className="text-sm" role="status">{paid ? `Deposit of ${formatMoney(paid.amount, paid.currency)} paid on ${paid.paidAt ? formatDateTime(paid.paidAt) : "—"}. Thank you.` : ""}</p>;
}
