import { Card, CardHeader } from "../../components/ui/card";
import { PageHeader } from "../../components/ui/page-header";
import { ChangePasswordForm } from "../../features/auth/components/change-password-form";
import { useCurrentMe } from "../../features/auth/components/use-current-me";
import { roleLabels } from "../../lib/format";

export function AccountRoute() {
  const me = useCurrentMe();
  return (
    <>
      <PageHeader title="Your account" description={`${me.user.displayName} · ${me.user.email}`} />
      <div className="flex flex-col gap-6">
        <Card>
          <CardHeader title="Firms" description="Where you work in Hushmark, and as what." />
          <ul className="px-5 py-3">
            {me.memberships.map((membership) => (
              <li key={membership.organizationId} className="flex min-h-11 items-center justify-between gap-3 border-b border-rule last:border-b-0">
                <span className="font-medium">{membership.organizationName}</span>
                <span className="text-sm text-muted">{roleLabels[membership.role]}</span>
              </li>
            ))}
          </ul>
        </Card>
        <Card>
          <CardHeader title="Password" />
          <div className="p-5">
            <ChangePasswordForm />
          </div>
        </Card>
      </div>
    </>
  );
}
