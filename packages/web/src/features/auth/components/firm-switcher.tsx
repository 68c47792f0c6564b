import type { Me } from "@hushmark/schemas";
import { useId } from "react";
import { useNavigate } from "react-router-dom";
import { toast } from "sonner";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { roleLabels } from "../../../lib/format";
import { useSwitchFirm } from "../api/switch-firm";

/** The current firm's name; a chooser when the person belongs to several firms. */
export function FirmSwitcher({ me }: { me: Me }) {
  const id = useId();
  const navigate = useNavigate();
  const switchFirm = useSwitchFirm({ leave: () => navigate(paths.projects) });

  if (me.memberships.length < 2) {
    return <span className="block truncate text-sm font-medium text-muted" title={me.membership.organizationName}>{me.membership.organizationName}</span>;
  }

  return (
    <div className="flex min-w-0 items-center gap-2">
      <label htmlFor={id} className="sr-only">
        Firm
      </label>
      <select
        id={id}
        value={me.membership.organizationId}
        disabled={switchFirm.isPending}
        onChange={(event) => {
          const organizationId = event.target.value;
          switchFirm.mutate(organizationId, {
            onSuccess: (next) => toast.success(`Now working in ${next.membership.organizationName}.`),
            onError: (error) => toast.error(isApiError(error) ? error.message : "We could not switch firms."),
          });
        }}
        className="min-h-11 max-w-56 truncate rounded-md border border-rule bg-panel px-2 text-sm font-medium"
      >
        {me.memberships.map((membership) => (
          <option key={membership.organizationId} value={membership.organizationId}>
            {membership.organizationName} ({roleLabels[membership.role]})
          </option>
        ))}
      </select>
    </div>
  );
}
