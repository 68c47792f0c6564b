import { ErrorState } from "../../components/ui/error-state";
import { PageLoading } from "../../components/ui/spinner";
import { useCurrentMe } from "../auth/components/use-current-me";
import { usePlan as usePlanQuery } from "../projects/api/get-plan";
import { useProject } from "../projects/api/get-project";
import { SketchScreen } from "./components/sketch-screen";

/** The Sketch section's route body (lazy-loaded, so the editor stays out of the main bundle). */
export default function SketchSection({ projectId }: { projectId: string }) {
  const me = useCurrentMe();
  const project = useProject(projectId);
  // The plan is read once per visit: the editor owns it from then on, and refetches would fight autosave.
  const plan = usePlanQuery(projectId);
  if (plan.isPending || project.isPending) return <PageLoading label="Opening the plan" />;
  if (plan.isError) return <ErrorState title="The plan did not load" error={plan.error} onRetry={() => void plan.refetch()} />;
  if (project.isError) return <ErrorState title="The project did not load" error={project.error} onRetry={() => void project.refetch()} />;
  const readOnly = !(me.membership.role === "owner" || me.membership.role === "surveyor");
  return <SketchScreen key={projectId} projectId={projectId} response={plan.data} title={project.data.title} readOnly={readOnly} />;
}
