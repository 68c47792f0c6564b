import type { ReactNode } from "react";
import { Card } from "../../../components/ui/card";
import type { ProjectSection } from "./sections";

/** Stands in for a section that is not built yet, saying what it will hold. */
export function SectionPlaceholder({ section, children }: { section: ProjectSection; children?: ReactNode }) {
  return (
    <Card className="p-6">
      <h2 className="text-xl font-semibold">{section.label}</h2>
      <p className="mt-2 max-w-3xl text-[15px]">{section.purpose}</p>
      <p className="mt-3 text-sm text-muted">This section is not built yet.</p>
      {children ? <div className="mt-5 border-t border-rule pt-4">{children}</div> : null}
    </Card>
  );
}
