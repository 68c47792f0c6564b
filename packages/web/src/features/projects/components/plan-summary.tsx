import { Skeleton } from "../../../components/ui/spinner";
import { ErrorState } from "../../../components/ui/error-state";
import { formatDateTime } from "../../../lib/format";
import { usePlan } from "../api/get-plan";

/** The stored plan's version and last save, until the sketch editor itself arrives. */
export function PlanSummary({ projectId }: { projectId: string }) {
  const plan = usePlan(projectId);
  if (plan.isPending) {
    return (
      <div className="flex flex-col gap-2" aria-label="Loading the plan">
        <Skeleton className="h-5 w-48" />
        <Skeleton className="h-4 w-64" />
      </div>
    );
  }
  if (plan.isError) return <ErrorState title="The plan did not load" error={plan.error} onRetry={() => void plan.refetch()} />;
  const { version, updatedAt, updatedBy } = plan.data;
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-1 text-[15px]">
      <dt className="text-muted">Plan version</dt>
      <dd className="numeric font-semibold">{version}</dd>
      <dt className="text-muted">Last saved</dt>
      <dd>{version === 0 ? "Not drawn yet" : `${formatDateTime(updatedAt)}${updatedBy ? ` by ${updatedBy}` : ""}`}</dd>
    </dl>
  );
}
