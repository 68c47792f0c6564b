import { Link, Navigate, Outlet, useParams } from "react-router-dom";
import { ButtonLink } from "../../components/ui/button";
import { EmptyState } from "../../components/ui/empty-state";
import { ErrorState } from "../../components/ui/error-state";
import { Skeleton } from "../../components/ui/spinner";
import { paths } from "../../config/paths";
import { useCurrentMe } from "../../features/auth/components/use-current-me";
import { useProject } from "../../features/projects/api/get-project";
import { ProjectStatusBadge } from "../../features/projects/components/project-status-badge";
import { SectionTabs } from "../../features/projects/components/section-tabs";
import { sectionsFor } from "../../features/projects/components/sections";
import { isApiError } from "../../lib/api-client";

function BackLink() {
  return (
    <Link to={paths.projects} className="inline-flex min-h-11 items-center rounded text-sm font-medium text-brand-strong hover:underline">
      ← All projects
    </Link>
  );
}

/** A project's header and section tabs; the sections are nested routes. */
export function ProjectRoute() {
  const { projectId = "" } = useParams();
  const me = useCurrentMe();
  const project = useProject(projectId);

  if (project.isPending) {
    return (
      <div className="flex flex-col gap-3" role="status" aria-label="Loading the project">
        <Skeleton className="h-4 w-24" />
        <Skeleton className="h-8 w-2/3" />
        <Skeleton className="h-11 w-full" />
        <Skeleton className="h-40 w-full" />
      </div>
    );
  }

  if (project.isError) {
    const missing = isApiError(project.error) && (project.error.status === 404 || project.error.status === 400);
    return (
      <div className="flex flex-col gap-4">
        <BackLink />
        {missing ? (
          <EmptyState title="No such project" action={<ButtonLink to={paths.projects}>See your projects</ButtonLink>}>
            It may have been removed, or it belongs to a firm you are not signed in to.
          </EmptyState>
        ) : (
          <ErrorState title="The project did not load" error={project.error} onRetry={() => void project.refetch()} />
        )}
      </div>
    );
  }

  const { title, siteAddress, status } = project.data;
  return (
    <div className="flex flex-col gap-5">
      <title>{`${title} · Hushmark`}</title>
      <div>
        <BackLink />
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
          <ProjectStatusBadge status={status} />
        </div>
        <p className="mt-1 text-[15px] text-muted">{siteAddress || "No site address yet"}</p>
      </div>
      <SectionTabs projectId={projectId} sections={sectionsFor(me.membership.role)} />
      <Outlet />
    </div>
  );
}

/** Opening a project lands on its first section the person may see. */
export function ProjectIndexRoute() {
  const { projectId = "" } = useParams();
  const me = useCurrentMe();
  const first = sectionsFor(me.membership.role)[0];
  return <Navigate to={paths.projectSection(projectId, first?.slug ?? "sketch")} replace />;
}
