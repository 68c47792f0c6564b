import { useState } from "react";
import { useNavigate } from "react-router-dom";
import { toast } from "sonner";
import { Button } from "../../components/ui/button";
import { EmptyState } from "../../components/ui/empty-state";
import { ErrorState } from "../../components/ui/error-state";
import { PageHeader } from "../../components/ui/page-header";
import { Skeleton } from "../../components/ui/spinner";
import { paths } from "../../config/paths";
import { useCurrentMe } from "../../features/auth/components/use-current-me";
import { useProjects } from "../../features/projects/api/get-projects";
import { NewProjectDialog } from "../../features/projects/components/new-project-dialog";
import { ProjectsTable } from "../../features/projects/components/projects-table";
import { can } from "../../lib/permissions";

function TableSkeleton() {
  return (
    <div className="flex flex-col gap-3 rounded-lg border border-rule bg-panel p-4" role="status" aria-label="Loading projects">
      {[0, 1, 2, 3].map((row) => (
        <div key={row} className="flex gap-4">
          <Skeleton className="h-5 flex-[2]" />
          <Skeleton className="h-5 flex-[2]" />
          <Skeleton className="h-5 flex-1" />
          <Skeleton className="h-5 flex-1" />
        </div>
      ))}
    </div>
  );
}

export function ProjectsRoute() {
  const me = useCurrentMe();
  const projects = useProjects();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const mayCreate = can.createProjects(me.membership.role);
  const isClient = me.membership.role === "client";

  const newButton = mayCreate ? <Button onClick={() => setCreating(true)}>New project</Button> : null;

  return (
    <>
      <PageHeader
        title="Projects"
        description={isClient ? `The projects ${me.membership.organizationName} is working on for you.` : `Every job of ${me.membership.organizationName}, from the first visit to verification.`}
        actions={newButton}
      />
      {projects.isPending ? (
        <TableSkeleton />
      ) : projects.isError ? (
        <ErrorState title="Projects did not load" error={projects.error} onRetry={() => void projects.refetch()} />
      ) : projects.data.length === 0 ? (
        <EmptyState title={isClient ? "No projects shared with you yet" : "No projects yet"} action={newButton}>
          {isClient
            ? "When your contractor adds you to a project, it appears here."
            : mayCreate
              ? "Create the first one with its title and site; the brief, sketch and measurements follow."
              : "A surveyor or the owner creates projects; they will appear here."}
        </EmptyState>
      ) : (
        <ProjectsTable projects={projects.data} showClients={!isClient} />
      )}
      {mayCreate ? (
        <NewProjectDialog
          open={creating}
          onClose={() => setCreating(false)}
          onCreated={(project) => {
            setCreating(false);
            toast.success(`Project “${project.title}” created.`);
            navigate(paths.project(project.id));
          }}
        />
      ) : null}
    </>
  );
}
