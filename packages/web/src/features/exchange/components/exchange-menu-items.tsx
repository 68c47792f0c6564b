import { useState } from "react";
import type { Command } from "@hushmark/editor-core";
import type { Plan } from "@hushmark/floorplan";
import type { Project } from "@hushmark/schemas";
import { useProject } from "../../projects/api/get-project";
import { ProjectSettingsDialog } from "../../projects/components/project-settings-dialog";
import { downloadFile } from "../model/download-file";
import { dxfFile, geoJsonFile, planDocumentFile, scheduleFile } from "../model/exchange-files";
import { DxfImportDialog } from "./dxf-import-dialog";
import { IfcImportDialog } from "./ifc-import-dialog";

const item = "min-h-11 rounded px-2 py-1.5 text-left text-[14px] hover:bg-brand-soft";

type Props = {
  plan: Plan; levelId: string; title: string; onCommand?: (cmd: Command) => void; onDone?: () => void;
  /** Told when one of the import or site dialogs opens or closes, so the menu can step aside. */
  onDialogChange?: (open: boolean) => void;
};

/**
 * Export menu entries for other programs: the shown level as DXF and GeoJSON (at the project's
 * site when it has one), the element schedule as CSV, the plan document; and, where the editor
 * lets it edit, DXF and IFC imports and the site location.
 */
export function ExchangeMenuItems({ projectId, ...props }: Props & { projectId?: string }) {
  return projectId ? <WithProject projectId={projectId} {...props} /> : <Items {...props} />;
}

function WithProject({ projectId, ...props }: Props & { projectId: string }) {
  // The project route has loaded this already; the menu reads it from the cache.
  const project = useProject(projectId);
  return <Items {...props} {...(project.data ? { project: project.data } : {})} />;
}

function Items({ plan, levelId, title, onCommand, onDone, onDialogChange, project }: Props & { project?: Project }) {
  const [note, setNote] = useState<string | null>(null);
  const [dialog, setDialogState] = useState<"dxf" | "ifc" | "site" | null>(null);
  const setDialog = (d: "dxf" | "ifc" | "site" | null) => {
    setDialogState(d);
    onDialogChange?.(d !== null);
  };
  const done = () => onDone?.();
  const site = project?.site ?? undefined;
  return (
    <>
      <button type="button" className={item} onClick={() => { downloadFile(dxfFile(plan, levelId, title)); done(); }}>CAD drawing of this level (DXF)</button>
      <button type="button" className={item} onClick={() => {
        const f = geoJsonFile(plan, levelId, title, site);
        downloadFile(f);
        setNote(f.frame === "local" ? "No site location is set, so the map file uses Hushmark's local frame: lengths and areas hold, positions are not real places." : null);
      }}>Map data of this level (GeoJSON)</button>
      <button type="button" className={item} onClick={() => { downloadFile(scheduleFile(plan, title)); done(); }}>Element schedule (CSV)</button>
      <button type="button" className={item} onClick={() => { downloadFile(planDocumentFile(plan, title)); done(); }}>Plan document (JSON)</button>
      {note ? <p className="px-1 text-xs text-muted">{note}</p> : null}
      {onCommand ? (
        <>
          <p className="mt-1 border-t border-rule px-2 pt-2 text-xs font-medium uppercase tracking-wide text-muted">Bring in</p>
          <button type="button" className={item} onClick={() => setDialog("dxf")}>Import DXF…</button>
          <button type="button" className={item} onClick={() => setDialog("ifc")}>Import IFC…</button>
          {project ? (
            <button type="button" className={item} onClick={() => setDialog("site")}>
              Site location…{site ? null : <span className="block text-xs text-muted">not set: map data uses the local frame</span>}
            </button>
          ) : null}
          <DxfImportDialog open={dialog === "dxf"} onClose={() => { setDialog(null); done(); }} plan={plan} levelId={levelId} onCommand={onCommand} />
          <IfcImportDialog open={dialog === "ifc"} onClose={() => { setDialog(null); done(); }} plan={plan} onCommand={onCommand} />
          {project ? <ProjectSettingsDialog open={dialog === "site"} onClose={() => { setDialog(null); done(); }} project={project} /> : null}
        </>
      ) : null}
    </>
  );
}
