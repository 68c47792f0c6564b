import { ButtonLink } from "../../components/ui/button";
import { EmptyState } from "../../components/ui/empty-state";
import { paths } from "../../config/paths";
import { AuthCard } from "../layouts/auth-layout";

/** A page or section that does not exist; `inline` inside a project, full page elsewhere. */
export function NotFoundRoute({ inline = false }: { inline?: boolean }) {
  if (inline) {
    return <EmptyState title="No such section">This project has no page at that address. Pick one of the tabs above.</EmptyState>;
  }
  return (
    <AuthCard title="Page not found" description="There is no page at this address. The link may be old or mistyped.">
      <ButtonLink to={paths.projects} className="w-full">
        Go to your projects
      </ButtonLink>
    </AuthCard>
  );
}
