import { useEffect, useRef } from "react";
import { NavLink, useLocation } from "react-router-dom";
import { paths } from "../../../config/paths";
import type { ProjectSection } from "./sections";

/** The project's sections as tabs; each is its own route so it can be linked and reloaded. */
export function SectionTabs({ projectId, sections }: { projectId: string; sections: readonly ProjectSection[] }) {
  const navRef = useRef<HTMLElement>(null);
  const { pathname } = useLocation();
  // On a phone the tabs scroll sideways; the current one is brought into view so it is never hidden off the edge.
  useEffect(() => {
    const active = navRef.current?.querySelector<HTMLElement>('[aria-current="page"]');
    active?.scrollIntoView?.({ block: "nearest", inline: "nearest" });
  }, [pathname]);
  return (
    <nav ref={navRef} aria-label="Project sections" className="-mx-4 overflow-x-auto border-b border-rule px-4 sm:mx-0 sm:px-0">
      <ul className="flex min-w-max gap-1">
        {sections.map((section) => (
          <li key={section.slug}>
            <NavLink
              to={paths.projectSection(projectId, section.slug)}
              className={({ isActive }) =>
                `-mb-px flex min-h-11 items-center border-b-[3px] px-3 text-[15px] font-medium ${
                  isActive ? "border-brand text-brand-strong" : "border-transparent text-muted hover:text-ink"
                }`
              }
            >
              {section.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
