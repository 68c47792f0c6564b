import { Navigate, NavLink, Link, Outlet, useLocation } from "react-router-dom";
import { ErrorState } from "../../components/ui/error-state";
import { PageLoading } from "../../components/ui/spinner";
import { Wordmark } from "../../components/ui/wordmark";
import { paths, signInWithNext } from "../../config/paths";
import { useMe } from "../../features/auth/api/get-me";
import { CurrentMeContext } from "../../features/auth/components/current-me-context";
import { useEarlyPlan } from "../../features/projects/api/use-early-plan";
import { FirmSwitcher } from "../../features/auth/components/firm-switcher";
import { UserMenu } from "../../features/auth/components/user-menu";
import { isApiError } from "../../lib/api-client";
import { can } from "../../lib/permissions";

function navClasses({ isActive }: { isActive: boolean }): string {
  return `flex min-h-11 items-center rounded-md px-3 text-[15px] font-medium ${isActive ? "bg-brand-soft text-brand-strong" : "text-ink hover:bg-ink/5"}`;
}

/** The sign-in guard and the top bar around every signed-in page. */
export function SignedInLayout() {
  const me = useMe();
  const location = useLocation();
  useEarlyPlan(location.pathname);

  if (me.isPending) return <PageLoading label="Checking your session" />;
  if (me.isError) {
    if (isApiError(me.error) && me.error.isUnauthorized) {
      return <Navigate to={signInWithNext(`${location.pathname}${location.search}`)} replace />;
    }
    return (
      <main className="mx-auto flex max-w-lg flex-col items-center gap-8 px-4 py-16">
        <Wordmark />
        <ErrorState title="Hushmark could not check your session" error={me.error} onRetry={() => void me.refetch()} />
      </main>
    );
  }

  const { role } = me.data.membership;
  const links = [
    { to: paths.projects, label: "Projects" },
    ...(can.seeAllSections(role) ? [{ to: paths.priceBook, label: "Price book" }] : []),
    ...(can.managePeople(role) ? [{ to: paths.people, label: "People" }] : []),
  ];
  return (
    <CurrentMeContext value={me.data}>
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-30 focus:rounded focus:bg-panel focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="sticky top-0 z-10 border-b border-rule bg-panel/95 backdrop-blur">
        <div className="mx-auto flex max-w-6xl items-center gap-2 px-3 py-1.5 sm:gap-3 sm:px-4">
          <Link to={paths.projects} aria-label="Hushmark home" className="flex min-h-11 shrink-0 items-center rounded-md">
            <Wordmark />
          </Link>
          <span aria-hidden="true" className="h-6 w-px shrink-0 bg-rule" />
          <div className="min-w-0 flex-1">
            <FirmSwitcher me={me.data} />
          </div>
          {/* Below the tablet width the links move into the account menu, so the bar never overlaps. */}
          <nav aria-label="Main" className="hidden items-center gap-1 md:flex">
            {links.map((link) => (
              <NavLink key={link.to} to={link.to} className={navClasses}>
                {link.label}
              </NavLink>
            ))}
          </nav>
          <UserMenu me={me.data} links={links} />
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:py-8">
        <Outlet />
      </main>
    </div>
    </CurrentMeContext>
  );
}
