import type { Me } from "@hushmark/schemas";
import { useEffect, useId, useRef, useState } from "react";
import { Link, NavLink, useNavigate } from "react-router-dom";
import { toast } from "sonner";
import { paths } from "../../../config/paths";
import { roleLabels } from "../../../lib/format";
import { useSignOut } from "../api/sign-out";

function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  const first = parts[0]?.[0] ?? "?";
  const last = parts.length > 1 ? (parts[parts.length - 1]?.[0] ?? "") : "";
  return `${first}${last}`.toUpperCase();
}

export interface MenuLink {
  to: string;
  label: string;
}

/**
 * The signed-in person's name, role and the way out. On a phone it also carries the main links
 * (`links`), which the top bar has no room for there.
 */
export function UserMenu({ me, links = [] }: { me: Me; links?: readonly MenuLink[] }) {
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const wrapper = useRef<HTMLDivElement>(null);
  const navigate = useNavigate();
  const signOut = useSignOut({ leave: () => navigate(paths.signIn, { replace: true }) });

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (wrapper.current && !wrapper.current.contains(event.target as Node)) setOpen(false);
    };
    const onKey = (event: KeyboardEvent) => {
      if (event.key === "Escape") setOpen(false);
    };
    document.addEventListener("pointerdown", onPointer);
    document.addEventListener("keydown", onKey);
    return () => {
      document.removeEventListener("pointerdown", onPointer);
      document.removeEventListener("keydown", onKey);
    };
  }, [open]);

  const onSignOut = () => {
    signOut.mutate(undefined, {
      onSuccess: () => toast.success("Signed out."),
      onError: () => toast.error("We could not reach the server, but this device has forgotten your session."),
    });
  };

  return (
    <div ref={wrapper} className="relative">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={menuId}
        aria-label={`Account menu for ${me.user.displayName}`}
        onClick={() => setOpen((value) => !value)}
        className="flex min-h-11 min-w-11 shrink-0 items-center justify-center gap-2 rounded-md px-1.5 hover:bg-ink/5 sm:px-2"
      >
        {links.length ? (
          <svg aria-hidden="true" viewBox="0 0 20 20" className="size-5 text-ink md:hidden">
            <path d="M3 5.5h14M3 10h14M3 14.5h14" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
          </svg>
        ) : null}
        <span aria-hidden="true" className="flex size-8 items-center justify-center rounded-full bg-brand-soft text-sm font-semibold text-brand-strong">
          {initials(me.user.displayName)}
        </span>
        <span className="hidden max-w-40 truncate text-sm font-medium lg:inline">{me.user.displayName}</span>
      </button>
      {open ? (
        <div id={menuId} className="absolute right-0 z-20 mt-1 w-64 max-w-[calc(100vw-1.5rem)] rounded-lg border border-rule bg-panel p-2 shadow-lg">
          {links.length ? (
            <nav aria-label="Main" className="mb-1 border-b border-rule pb-1 md:hidden">
              {links.map((link) => (
                <NavLink
                  key={link.to}
                  to={link.to}
                  onClick={() => setOpen(false)}
                  className={({ isActive }) => `flex min-h-11 w-full items-center rounded-md px-2 font-medium ${isActive ? "bg-brand-soft text-brand-strong" : "text-ink hover:bg-ink/5"}`}
                >
                  {link.label}
                </NavLink>
              ))}
            </nav>
          ) : null}
          <div className="border-b border-rule px-2 pb-2">
            <p className="truncate font-medium">{me.user.displayName}</p>
            <p className="truncate text-sm text-muted">{me.user.email}</p>
            <p className="mt-1 text-sm text-muted">
              {roleLabels[me.membership.role]} at {me.membership.organizationName}
            </p>
          </div>
          <Link
            to={paths.account}
            onClick={() => setOpen(false)}
            className="mt-1 flex min-h-11 w-full items-center rounded-md px-2 font-medium text-ink hover:bg-ink/5"
          >
            Your account
          </Link>
          <button
            type="button"
            onClick={onSignOut}
            disabled={signOut.isPending}
            className="flex min-h-11 w-full items-center rounded-md px-2 text-left font-medium text-ink hover:bg-ink/5"
          >
            {signOut.isPending ? "Signing out…" : "Sign out"}
          </button>
        </div>
      ) : null}
    </div>
  );
}
