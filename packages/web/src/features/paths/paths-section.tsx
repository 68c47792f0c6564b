import { ErrorState } from "../../components/ui/error-state";
import { PageLoading } from "../../components/ui/spinner";
import { useCurrentMe } from "../auth/components/use-current-me";
import { usePlan } from "../projects/api/get-plan";
import { useProject } from "../projects/api/get-project";
import { PathsScreen } from "./components/paths-screen";

/** The Paths section's route body, lazy-loaded with the editor's canvas. */
export default function PathsSection({ projectId }: { projectId: string }) {
  const me = useCurrentMe();
  const project = useProject(projectId);
  const plan = usePlan(projectId);
  if (plan.isPending || project.isPending) return <PageLoading label="Opening the plan" />;
  if (plan.isError) return <ErrorState title="The plan did not load" error={plan.error} onRetry={() => void plan.refetch()} />;
  if (project.isError) return <ErrorState title="The project did not load" error={project.error} onRetry={() => void project.refetch()} />;
  const role = me.membership.role;
  return <PathsScreen key={`${projectId}-${plan.data.version === 0 ? "new" : "drawn"}`} projectId={projectId} response={plan.data} title={project.data.title} plain={role === "client"} canEdit={role === "owner" || role === "surveyor"} />;
}
