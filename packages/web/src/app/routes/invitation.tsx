import { useNavigate, useParams } from "react-router-dom";
import { toast } from "sonner";
import { ErrorState } from "../../components/ui/error-state";
import { Skeleton } from "../../components/ui/spinner";
import { paths } from "../../config/paths";
import { useInvitation } from "../../features/auth/api/get-invitation";
import { AcceptInvitationForm } from "../../features/auth/components/accept-invitation-form";
import { isApiError } from "../../lib/api-client";
import { roleDescriptions, roleLabels } from "../../lib/format";
import { AuthCard, AuthLink } from "../layouts/auth-layout";

export function InvitationRoute() {
  const { token = "" } = useParams();
  const navigate = useNavigate();
  const invitation = useInvitation(token);

  if (invitation.isPending) {
    return (
      <AuthCard title="Opening your invitation">
        <div className="flex flex-col gap-3" role="status" aria-label="Loading the invitation">
          <Skeleton className="h-5 w-3/4" />
          <Skeleton className="h-11 w-full" />
          <Skeleton className="h-11 w-full" />
        </div>
      </AuthCard>
    );
  }

  if (invitation.isError) {
    const gone = isApiError(invitation.error) && (invitation.error.status === 404 || invitation.error.status === 400);
    return (
      <AuthCard title="This invitation does not work" footer={<AuthLink to={paths.signIn}>Go to sign in</AuthLink>}>
        {gone ? (
          <p className="text-[15px]">
            It may have expired, been revoked, or been used already. Ask the person who invited you to send a new one.
          </p>
        ) : (
          <ErrorState title="The invitation did not load" error={invitation.error} onRetry={() => void invitation.refetch()} />
        )}
      </AuthCard>
    );
  }

  const preview = invitation.data;
  return (
    <AuthCard
      title={`Join ${preview.organizationName}`}
      description={
        <p>
          You are invited as <strong className="text-ink">{roleLabels[preview.role].toLowerCase()}</strong>: {roleDescriptions[preview.role].toLowerCase()}.
        </p>
      }
    >
      <AcceptInvitationForm
        token={token}
        preview={preview}
        onAccepted={(me) => {
          toast.success(`Welcome to ${me.membership.organizationName}.`);
          navigate(paths.projects, { replace: true });
        }}
      />
    </AuthCard>
  );
}
