import { Card, CardHeader } from "../../components/ui/card";
import { EmptyState } from "../../components/ui/empty-state";
import { ErrorState } from "../../components/ui/error-state";
import { PageHeader } from "../../components/ui/page-header";
import { Skeleton } from "../../components/ui/spinner";
import { useCurrentMe } from "../../features/auth/components/use-current-me";
import { usePeople } from "../../features/people/api/get-people";
import { InvitationsList } from "../../features/people/components/invitations-list";
import { InviteForm } from "../../features/people/components/invite-form";
import { MembersList } from "../../features/people/components/members-list";
import { can } from "../../lib/permissions";

function ListSkeleton({ label }: { label: string }) {
  return (
    <div className="flex flex-col gap-3 p-5" role="status" aria-label={label}>
      <Skeleton className="h-5 w-1/2" />
      <Skeleton className="h-5 w-2/3" />
      <Skeleton className="h-5 w-1/3" />
    </div>
  );
}

function PeopleLists({ myUserId }: { myUserId: string }) {
  const people = usePeople();
  if (people.isError) {
    return <ErrorState title="People did not load" error={people.error} onRetry={() => void people.refetch()} />;
  }
  const pending = people.data?.invitations.filter((invitation) => invitation.acceptedAt === null) ?? [];
  return (
    <>
      <Card>
        <CardHeader title="Members" description={people.data ? `${people.data.members.length} with access to this firm` : undefined} />
        {people.isPending ? <ListSkeleton label="Loading members" /> : <MembersList members={people.data.members} myUserId={myUserId} />}
      </Card>
      <Card>
        <CardHeader title="Pending invitations" description="Links not used yet. Revoking one makes it stop working." />
        {people.isPending ? (
          <ListSkeleton label="Loading invitations" />
        ) : pending.length === 0 ? (
          <div className="p-5">
            <EmptyState title="No invitations waiting">Everyone you invited has joined, or you have not invited anyone yet.</EmptyState>
          </div>
        ) : (
          <InvitationsList invitations={pending} />
        )}
      </Card>
    </>
  );
}

export function PeopleRoute() {
  const me = useCurrentMe();
  if (!can.managePeople(me.membership.role)) {
    return (
      <>
        <PageHeader title="People" />
        <EmptyState title="Only the firm's owner manages people">Ask the owner of {me.membership.organizationName} to invite someone or change a role.</EmptyState>
      </>
    );
  }
  return (
    <>
      <PageHeader title="People" description={`Who can work in ${me.membership.organizationName}, and as what.`} />
      {/* On a laptop the invite form sits beside the lists; on a tablet it comes first. */}
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <Card className="lg:sticky lg:top-20 lg:order-2">
          <CardHeader title="Invite someone" description="They get an e-mail with a link to set their name and password." />
          <div className="p-5">
            <InviteForm />
          </div>
        </Card>
        <div className="flex min-w-0 flex-col gap-6 lg:order-1">
          <PeopleLists myUserId={me.user.id} />
        </div>
      </div>
    </>
  );
}
