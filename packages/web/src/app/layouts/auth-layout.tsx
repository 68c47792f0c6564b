import type { ReactNode } from "react";
import { Link, Outlet } from "react-router-dom";
import { Wordmark } from "../../components/ui/wordmark";
import { paths } from "../../config/paths";

/** The frame around the signed-out pages: the mark, one card, nothing else to distract. */
export function AuthLayout() {
  return (
    <div className="flex min-h-screen flex-col items-center px-4 py-10 sm:py-16">
      <Link to={paths.signIn} aria-label="Hushmark" className="mb-8 rounded-md">
        <Wordmark />
      </Link>
      <main className="w-full max-w-md">
        <Outlet />
      </main>
    </div>
  );
}

/** One signed-out page: heading, a line of context, the form, and links below. */
export function AuthCard({ title, description, children, footer }: { title: string; description?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <>
      <title>{`${title} · Hushmark`}</title>
      <div className="rounded-lg border border-rule bg-panel p-6 shadow-sm sm:p-8">
        <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
        {description ? <div className="mt-1 text-[15px] text-muted">{description}</div> : null}
        <div className="mt-6">{children}</div>
      </div>
      {footer ? <div className="mt-5 flex flex-col items-center gap-1 text-center text-[15px]">{footer}</div> : null}
    </>
  );
}

export function AuthLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Link to={to} className="inline-flex min-h-11 items-center rounded px-1 font-medium text-brand-strong underline underline-offset-2">
      {children}
    </Link>
  );
}
