import { useEffect, useState } from "react";
import type { Command } from "@hushmark/editor-core";
import { DXF_UNIT_CHOICES, type DxfImport, type DxfLayerRole, type DxfSurvey, type DxfUnitChoice, type Plan } from "@hushmark/floorplan";
import { Button } from "../../../components/ui/button";
import { Dialog } from "../../../components/ui/dialog";
import { defaultDxfRunner, type DxfRunner } from "../model/dxf-runner";
import { importDxfCommand } from "../model/import-command";
import { layerRoleGuess } from "../model/layer-guess";
import { DxfReportView } from "./dxf-report-view";

const ROLE_LABELS: Record<DxfLayerRole, string> = { walls: "Walls (room outlines)", doors: "Doors", windows: "Windows", underlay: "Underlay to trace", ignore: "Leave out" };

type Step =
  | { kind: "pick" }
  | { kind: "reading" }
  | { kind: "map"; survey: Extract<DxfSurvey, { ok: true }> }
  | { kind: "converting"; done: number; total: number }
  | { kind: "report"; imported: DxfImport };

/**
 * Brings a CAD drawing onto the shown level: pick a DXF, say what each layer holds (and the units
 * when the drawing does not), watch it convert off the main thread, read the report, add it.
 */
export function DxfImportDialog({ open, onClose, plan, levelId, onCommand, runner: given }: {
  open: boolean; onClose: () => void; plan: Plan; levelId: string; onCommand: (cmd: Command) => void; runner?: DxfRunner;
}) {
  const [runner, setRunner] = useState<DxfRunner | null>(given ?? null);
  // The worker lives while the dialog is open; a large conversion is abandoned with it on close.
  useEffect(() => {
    if (given) { setRunner(given); return; }
    if (!open) return;
    const r = defaultDxfRunner();
    setRunner(r);
    return () => { r.dispose(); setRunner(null); };
  }, [given, open]);
  const [step, setStep] = useState<Step>({ kind: "pick" });
  const [file, setFile] = useState<File | null>(null);
  const [roles, setRoles] = useState<Record<string, DxfLayerRole>>({});
  const [units, setUnits] = useState<DxfUnitChoice | "">("");
  const [toleranceMm, setToleranceMm] = useState(10);
  const [toOrigin, setToOrigin] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const level = plan.elements[levelId];
  const close = () => { setStep({ kind: "pick" }); setProblem(null); setFile(null); onClose(); };

  const pick = async (f: File | undefined) => {
    if (!f || !runner) return;
    setFile(f); setProblem(null); setStep({ kind: "reading" });
    try {
      const survey = await runner.survey(f);
      if (!survey.ok) { setProblem(survey.problem.message); setStep({ kind: "pick" }); return; }
      setRoles(Object.fromEntries(survey.layers.map((l) => [l.name, layerRoleGuess(l.name)])));
      setUnits("");
      setStep({ kind: "map", survey });
    } catch (e) { setProblem((e as Error).message); setStep({ kind: "pick" }); }
  };

  const convert = async (survey: Extract<DxfSurvey, { ok: true }>) => {
    if (!file || !runner) return;
    setProblem(null);
    setStep({ kind: "converting", done: 0, total: survey.entityCount });
    try {
      const result = await runner.convert(file, {
        levelId, layerRoles: roles, chordToleranceM: toleranceMm / 1000, moveToOrigin: toOrigin, ...(units ? { units } : {}),
      }, (done, total) => setStep({ kind: "converting", done, total }));
      if (!result.ok) { setProblem(result.problem.message); setStep({ kind: "map", survey }); return; }
      setStep({ kind: "report", imported: result.imported });
    } catch (e) { setProblem((e as Error).message); setStep({ kind: "map", survey }); }
  };

  const add = (imported: DxfImport) => {
    const cmd = importDxfCommand(plan, imported);
    if ("problem" in cmd) { setProblem(cmd.problem); return; }
    onCommand(cmd);
    close();
  };

  return (
    <Dialog open={open} onClose={close} title="Bring in a CAD drawing" description={`DXF text files; the rooms go on ${level?.type === "level" ? level.name : "this level"}.`}>
      {step.kind === "pick" || step.kind === "reading" ? (
        <label className="flex flex-col gap-1 text-sm font-medium">
          Drawing file (.dxf)
          <input type="file" accept=".dxf,application/dxf,image/vnd.dxf" disabled={step.kind === "reading"} onChange={(e) => void pick(e.target.files?.[0])} className="text-sm text-muted file:mr-3 file:min-h-11 file:cursor-pointer file:rounded-md file:border file:border-rule file:bg-panel file:px-4 file:text-sm file:font-medium file:text-ink hover:file:border-muted" />
        </label>
      ) : null}
      {step.kind === "pick" ? (
        <div className="flex justify-end">
          <Button variant="secondary" onClick={close}>Cancel</Button>
        </div>
      ) : null}
      {step.kind === "reading" ? <p className="text-sm">Reading the drawing…</p> : null}
      {step.kind === "map" ? (
        <form className="flex flex-col gap-3" onSubmit={(e) => { e.preventDefault(); void convert(step.survey); }}>
          {step.survey.units.status === "missing" ? (
            <label className="flex flex-col gap-1 text-sm">
              <span className="font-medium">Units</span>
              <span>{step.survey.units.message}</span>
              <select required value={units} onChange={(e) => setUnits(e.target.value as DxfUnitChoice)} className="min-h-9 rounded border border-rule px-2">
                <option value="">Choose…</option>
                {Object.keys(DXF_UNIT_CHOICES).map((u) => <option key={u} value={u}>{u}</option>)}
              </select>
            </label>
          ) : (
            <p className="text-sm">Drawn in {step.survey.units.name}; {step.survey.entityCount} entities.</p>
          )}
          <table className="text-sm">
            <thead><tr><th className="text-left">Layer</th><th className="text-right">Entities</th><th className="text-left pl-2">Holds</th></tr></thead>
            <tbody>
              {step.survey.layers.map((l) => (
                <tr key={l.name}>
                  <td>{l.name}</td>
                  <td className="text-right tabular-nums">{l.entities}</td>
                  <td className="pl-2">
                    <select aria-label={`Layer ${l.name}`} value={roles[l.name] ?? "underlay"} onChange={(e) => setRoles((r) => ({ ...r, [l.name]: e.target.value as DxfLayerRole }))} className="min-h-9 rounded border border-rule px-2">
                      {(Object.keys(ROLE_LABELS) as DxfLayerRole[]).map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
                    </select>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <label className="flex items-center gap-2 text-sm">
            Arcs to within
            <input type="number" min={0.5} max={100} step={0.5} value={toleranceMm} onChange={(e) => setToleranceMm(Number(e.target.value) || 10)} className="w-20 rounded border border-rule px-2" aria-label="Arc tolerance in millimetres" />
            mm
          </label>
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={toOrigin} onChange={(e) => setToOrigin(e.target.checked)} className="h-4 w-4 accent-brand" />
            Move the drawing to the plan origin (for drawings in site coordinates)
          </label>
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={close}>Cancel</Button>
            <Button type="submit">Convert</Button>
          </div>
        </form>
      ) : null}
      {step.kind === "converting" ? (
        <div className="flex flex-col gap-1 text-sm">
          <p>Converting… {step.done} of {step.total} entities</p>
          <progress aria-label="Conversion progress" max={Math.max(step.total, 1)} value={step.done} className="w-full" />
        </div>
      ) : null}
      {step.kind === "report" ? (
        <div className="flex flex-col gap-3">
          <DxfReportView report={step.imported.report} />
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={close}>Cancel</Button>
            <Button disabled={step.imported.rooms.length === 0} onClick={() => add(step.imported)}>Add to plan</Button>
          </div>
        </div>
      ) : null}
      {problem ? <p role="alert" className="text-sm text-danger">{problem}</p> : null}
    </Dialog>
  );
}
