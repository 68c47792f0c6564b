import { ROLES, type Member, type Role } from "@hushmark/schemas";
import { useState } from "react";
import { toast } from "sonner";
import { Badge } from "../../../components/ui/badge";
import { Button } from "../../../components/ui/button";
import { isApiError } from "../../../lib/api-client";
import { formatDate, roleLabels } from "../../../lib/format";
import { useChangeRole } from "../api/change-role";
import { useRemoveMember } from "../api/remove-member";

const roleOptions = ROLES.map((role) => ({ value: role, label: roleLabels[role] }));

function errorText(error: unknown, fallback: string): string {
  return isApiError(error) ? error.message : fallback;
}

function MemberRow({ member, isMe }: { member: Member; isMe: boolean }) {
  const [confirming, setConfirming] = useState(false);
  const changeRole = useChangeRole();
  const remove = useRemoveMember();
  const selectId = `role-${member.membershipId}`;

  const onRoleChange = (role: Role) => {
    changeRole.mutate(
      { membershipId: member.membershipId, role },
      {
        onSuccess: (updated) => toast.success(`${updated.displayName} is now ${roleLabels[updated.role].toLowerCase()}.`),
        onError: (error) => toast.error(errorText(error, "The role did not change.")),
      },
    );
  };

  const onRemove = () => {
    remove.mutate(member.membershipId, {
      onSuccess: () => toast.success(`${member.displayName} no longer has access to this firm.`),
      onError: (error) => toast.error(errorText(error, `${member.displayName} was not removed.`)),
      onSettled: () => setConfirming(false),
    });
  };

  return (
    <li className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-rule px-5 py-3 last:border-b-0">
      <div className="min-w-0 flex-1 basis-56">
        <p className="truncate font-medium">
          {member.displayName} {isMe ? <Badge tone="brand">You</Badge> : null}
        </p>
        <p className="truncate text-sm text-muted">
          {member.email} · joined <time dateTime={member.joinedAt}>{formatDate(member.joinedAt)}</time>
        </p>
      </div>
      {isMe ? (
        <span className="text-sm text-muted">{roleLabels[member.role]}</span>
      ) : confirming ? (
        <div className="flex flex-wrap items-center gap-2" role="group" aria-label={`Confirm removing ${member.displayName}`}>
          <span className="text-sm">Remove {member.displayName}?</span>
          <Button variant="danger" pending={remove.isPending} onClick={onRemove}>
            Yes, remove
          </Button>
          <Button variant="secondary" onClick={() => setConfirming(false)}>
            Keep
          </Button>
        </div>
      ) : (
        <div className="flex items-center gap-2">
          <label htmlFor={selectId} className="sr-only">
            Access for {member.displayName}
          </label>
          <select
            id={selectId}
            value={member.role}
            disabled={changeRole.isPending}
            onChange={(event) => onRoleChange(event.target.value as Role)}
            className="min-h-11 rounded-md border border-rule bg-panel px-2 text-[15px]"
          >
            {roleOptions.map((option) => (
              <option key={option.value} value={option.value}>
                {option.label}
              </option>
            ))}
          </select>
          <Button variant="ghost" aria-label={`Remove ${member.displayName}`} onClick={() => setConfirming(true)}>
            Remove
          </Button>
        </div>
      )}
    </li>
  );
}

export function MembersList({ members, myUserId }: { members: Member[]; myUserId: string }) {
  return (
    <ul aria-label="Members">
      {members.map((member) => (
        <MemberRow key={member.membershipId} member={member} isMe={member.userId === myUserId} />
      ))}
    </ul>
  );
}
