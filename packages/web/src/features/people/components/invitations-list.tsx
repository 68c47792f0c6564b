import type { Invitation } from "@hushmark/schemas";
import { toast } from "sonner";
import { Badge } from "../../../components/ui/badge";
import { Button } from "../../../components/ui/button";
import { isApiError } from "../../../lib/api-client";
import { formatDate, roleLabels } from "../../../lib/format";
import { useRevokeInvitation } from "../api/revoke-invitation";

function InvitationRow({ invitation, now }: { invitation: Invitation; now: number }) {
  const revoke = useRevokeInvitation();
  const expired = new Date(invitation.expiresAt).getTime() < now;
  return (
    <li className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-rule px-5 py-3 last:border-b-0">
      <div className="min-w-0 flex-1 basis-56">
        <p className="truncate font-medium">{invitation.email}</p>
        <p className="text-sm text-muted">
          {roleLabels[invitation.role]} · invited by {invitation.invitedBy} · {expired ? "expired " : "expires "}
          <time dateTime={invitation.expiresAt}>{formatDate(invitation.expiresAt)}</time>
        </p>
      </div>
      {expired ? <Badge tone="caution">Expired</Badge> : <Badge>Waiting</Badge>}
      <Button
        variant="secondary"
        pending={revoke.isPending}
        aria-label={`Revoke invitation for ${invitation.email}`}
        onClick={() =>
          revoke.mutate(invitation.id, {
            onSuccess: () => toast.success(`The invitation for ${invitation.email} no longer works.`),
            onError: (error) => toast.error(isApiError(error) ? error.message : "The invitation was not revoked."),
          })
        }
      >
        Revoke
      </Button>
    </li>
  );
}

/** Invitations nobody has accepted yet. */
export function InvitationsList({ invitations, now = Date.now() }: { invitations: Invitation[]; now?: number }) {
  return (
    <ul aria-label="Pending invitations">
      {invitations.map((invitation) => (
        <InvitationRow key={invitation.id} invitation={invitation} now={now} />
      ))}
    </ul>
  );
}
