import type { Proposal } from "@hushmark/schemas";
import { useState } from "react";
import { Button } from "../../../components/ui/button";
import { isApiError } from "../../../lib/api-client";
import { formatDateTime } from "../../../lib/format";
import { useCommentProposal } from "../api/proposals";

const kindWords = { comment: "", changes_asked: "asked for changes", approved: "approved" } as const;

/** Comments back and forth, with decisions in the same thread (who and when). */
export function Comments({ proposal, projectId }: { proposal: Proposal; projectId: string }) {
  const [body, setBody] = useState("");
  const [error, setError] = useState<string | null>(null);
  const add = useCommentProposal(projectId, proposal.id);
  return (
    <div className="flex flex-col gap-3">
      <ul className="flex flex-col gap-2" aria-label="Comments">
        {proposal.comments.length === 0 ? <li className="text-sm text-muted">No comments yet.</li> : null}
        {proposal.comments.map((c) => (
          <li key={c.id} className={`rounded-md border p-3 text-sm ${c.kind === "approved" ? "border-good/40 bg-good/5" : c.kind === "changes_asked" ? "border-caution/40 bg-caution/5" : "border-rule"}`}>
            <p className="text-muted"><span className="font-medium text-ink">{c.authorName}</span> {kindWords[c.kind]} · version {c.version} · {formatDateTime(c.createdAt)}</p>
            {c.body ? <p className="mt-1 whitespace-pre-wrap">{c.body}</p> : null}
          </li>
        ))}
      </ul>
      <form className="flex flex-col gap-2" onSubmit={(e) => {
        e.preventDefault();
        setError(null);
        add.mutate(body, { onSuccess: () => setBody(""), onError: (err) => setError(isApiError(err) ? err.message : "The comment was not sent.") });
      }}>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Add a comment
          <textarea className="min-h-20 rounded-md border border-rule bg-panel p-3 text-[15px]" value={body} onChange={(e) => setBody(e.target.value)} maxLength={4000} />
        </label>
        {error ? <p role="alert" className="text-sm font-medium text-danger">{error}</p> : null}
        <div><Button type="submit" variant="secondary" pending={add.isPending} disabled={!body.trim()}>Send comment</Button></div>
      </form>
    </div>
  );
}
