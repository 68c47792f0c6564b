import { useEffect, useMemo, useState } from "react";
import type { Command } from "@hushmark/editor-core";
import { constructionCatalogue, levelsByElevation, type Plan } from "@hushmark/floorplan";
import type { IfcImport, IfcSurvey } from "@hushmark/floorplan/ifc";
import { Button } from "../../../components/ui/button";
import { Dialog } from "../../../components/ui/dialog";
import { workerIfcRunner, type IfcRunner } from "../model/ifc-runner";
import { importIfcCommand } from "../model/import-command";
import { IfcReportView } from "./ifc-report-view";

type Step =
  | { kind: "pick" }
  | { kind: "reading"; done: number; total: number }
  | { kind: "confirm"; survey: IfcSurvey }
  | { kind: "converting" }
  | { kind: "report"; imported: IfcImport };

const NEW_LEVEL = "";
const count = (n: number, one: string) => `${n} ${one}${n === 1 ? "" : "s"}`;

/**
 * Brings a building model in: pick an IFC file, watch it read off the main thread, confirm the
 * storeys (each as a new level or onto one the plan has), map each wall layer set to a catalogue
 * construction, read the report, add it all as one edit.
 */
export function IfcImportDialog({ open, onClose, plan, onCommand, runner: given }: {
  open: boolean; onClose: () => void; plan: Plan; onCommand: (cmd: Command) => void; runner?: IfcRunner;
}) {
  const [runner, setRunner] = useState<IfcRunner | null>(given ?? null);
  useEffect(() => {
    if (given) { setRunner(given); return; }
    if (!open) return;
    const r = workerIfcRunner();
    setRunner(r);
    return () => { r.dispose(); setRunner(null); };
  }, [given, open]);
  const [step, setStep] = useState<Step>({ kind: "pick" });
  const [take, setTake] = useState<Record<string, boolean>>({});
  const [onto, setOnto] = useState<Record<string, string>>({});
  const [constructionFor, setConstructionFor] = useState<Record<string, string>>({});
  const [toCentres, setToCentres] = useState(true);
  const [problem, setProblem] = useState<string | null>(null);
  const levels = levelsByElevation(plan);
  const walls = useMemo(() => Object.values(constructionCatalogue.constructions).filter((c) => c.category === "wall").sort((a, b) => a.name.localeCompare(b.name)), []);
  const defaultWall = constructionCatalogue.constructions[plan.defaults.interiorWallConstructionId];
  const close = () => { setStep({ kind: "pick" }); setProblem(null); onClose(); };

  const pick = async (f: File | undefined) => {
    if (!f || !runner) return;
    setProblem(null);
    setStep({ kind: "reading", done: 0, total: 0 });
    try {
      const read = await runner.read(f, (done, total) => setStep({ kind: "reading", done, total }));
      if (!read.ok) { setProblem(read.problem.message); setStep({ kind: "pick" }); return; }
      setTake(Object.fromEntries(read.survey.storeys.map((s) => [s.globalId, true])));
      setOnto({});
      setConstructionFor({});
      setStep({ kind: "confirm", survey: read.survey });
    } catch (e) { setProblem((e as Error).message); setStep({ kind: "pick" }); }
  };

  const convert = async (survey: IfcSurvey) => {
    if (!runner) return;
    const storeys = survey.storeys.filter((s) => take[s.globalId]).map((s) => s.globalId);
    if (storeys.length === 0) { setProblem("Choose at least one storey."); return; }
    setProblem(null);
    setStep({ kind: "converting" });
    try {
      const imported = await runner.convert({
        storeys,
        ontoLevels: Object.fromEntries(Object.entries(onto).filter(([k, v]) => v !== NEW_LEVEL && storeys.includes(k))),
        constructionFor: Object.fromEntries(Object.entries(constructionFor).filter(([, v]) => v)),
        wallConstructionId: plan.defaults.interiorWallConstructionId,
        roomOutlines: toCentres ? "wall-centre" : "as-drawn",
      });
      setStep({ kind: "report", imported });
    } catch (e) { setProblem((e as Error).message); setStep({ kind: "confirm", survey }); }
  };

  const add = (imported: IfcImport) => {
    const cmd = importIfcCommand(plan, imported);
    if ("problem" in cmd) { setProblem(cmd.problem); return; }
    onCommand(cmd);
    close();
  };

  return (
    <Dialog open={open} onClose={close} title="Bring in a building model" description="IFC files (.ifc): storeys become levels, spaces rooms, and walls, doors and windows keep their sizes.">
      {step.kind === "pick" || step.kind === "reading" ? (
        <label className="flex flex-col gap-1 text-sm font-medium">
          Model file (.ifc)
          <input type="file" accept=".ifc,application/x-step" disabled={step.kind === "reading"} onChange={(e) => void pick(e.target.files?.[0])} className="text-sm text-muted file:mr-3 file:min-h-11 file:cursor-pointer file:rounded-md file:border file:border-rule file:bg-panel file:px-4 file:text-sm file:font-medium file:text-ink hover:file:border-muted" />
        </label>
      ) : null}
      {step.kind === "pick" ? (
        <div className="flex justify-end">
          <Button variant="secondary" onClick={close}>Cancel</Button>
        </div>
      ) : null}
      {step.kind === "reading" ? (
        <div className="flex flex-col gap-1 text-sm">
          <p>Reading the model… {step.total > 0 ? `${step.done} of ${step.total} elements` : ""}</p>
          <progress aria-label="Reading progress" max={Math.max(step.total, 1)} value={step.done} className="w-full" />
        </div>
      ) : null}
      {step.kind === "confirm" ? (
        <form className="flex max-h-[60vh] flex-col gap-3 overflow-y-auto" onSubmit={(e) => { e.preventDefault(); void convert(step.survey); }}>
          <p className="text-sm">{step.survey.schema}, lengths in {step.survey.lengthUnit.name}s.</p>
          <fieldset className="flex min-w-0 flex-col gap-2 text-sm">
            <legend className="font-medium">Storeys</legend>
            {step.survey.storeys.map((s) => (
              <div key={s.globalId} className="flex flex-wrap items-center gap-2">
                <label className="flex min-h-9 items-center gap-2">
                  <input type="checkbox" checked={take[s.globalId] ?? false} onChange={(e) => setTake((t) => ({ ...t, [s.globalId]: e.target.checked }))} className="h-4 w-4 accent-brand" />
                  {s.name} at {s.elevationM.toFixed(2)} m — {count(s.spaces, "space")}, {count(s.walls, "wall")}, {count(s.doors, "door")}, {count(s.windows, "window")}
                </label>
                <select aria-label={`Level for ${s.name}`} value={onto[s.globalId] ?? NEW_LEVEL} disabled={!take[s.globalId]} onChange={(e) => setOnto((o) => ({ ...o, [s.globalId]: e.target.value }))} className="min-h-9 rounded border border-rule px-2">
                  <option value={NEW_LEVEL}>as a new level</option>
                  {levels.map((l) => <option key={l.id} value={l.id}>onto {l.name}</option>)}
                </select>
              </div>
            ))}
          </fieldset>
          {step.survey.layerSets.length > 0 ? (
            <fieldset className="flex min-w-0 flex-col gap-2 text-sm">
              <legend className="font-medium">Wall constructions</legend>
              <p className="text-muted">Each wall type's material layers, as the file lists them. Choose the catalogue construction that matches, so the analysis uses its sound insulation.</p>
              {step.survey.layerSets.map((set) => (
                <div key={set.key} className="flex flex-col gap-1 rounded border border-rule p-2">
                  <span className="font-medium">{set.name} — {set.walls} {set.walls === 1 ? "wall" : "walls"}, {(set.totalThicknessM * 1000).toFixed(0)} mm</span>
                  <span className="text-muted">{set.layers.map((l) => `${l.material}${l.thicknessM > 0 ? ` ${(l.thicknessM * 1000).toFixed(1)} mm` : ""}`).join(" · ")}</span>
                  <select aria-label={`Construction for ${set.name}`} value={constructionFor[set.key] ?? ""} onChange={(e) => setConstructionFor((c) => ({ ...c, [set.key]: e.target.value }))} className="min-h-9 w-full min-w-0 rounded border border-rule px-2">
                    <option value="">Plan default ({defaultWall?.name ?? plan.defaults.interiorWallConstructionId})</option>
                    {walls.map((w) => <option key={w.id} value={w.id}>{w.name}</option>)}
                  </select>
                </div>
              ))}
              {step.survey.wallsWithoutLayers > 0 ? <p className="text-muted">{step.survey.wallsWithoutLayers} walls have no material layers and get the plan default.</p> : null}
            </fieldset>
          ) : null}
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={toCentres} onChange={(e) => setToCentres(e.target.checked)} className="h-4 w-4 accent-brand" />
            Draw room edges along wall centrelines (as the Sketch does), not at the wall faces
          </label>
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={close}>Cancel</Button>
            <Button type="submit">Convert</Button>
          </div>
        </form>
      ) : null}
      {step.kind === "converting" ? <p className="text-sm">Converting…</p> : null}
      {step.kind === "report" ? (
        <div className="flex max-h-[60vh] flex-col gap-3 overflow-y-auto">
          <IfcReportView report={step.imported.report} />
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={close}>Cancel</Button>
            <Button disabled={step.imported.rooms.length + step.imported.walls.length === 0} onClick={() => add(step.imported)}>Add to plan</Button>
          </div>
        </div>
      ) : null}
      {problem ? <p role="alert" className="text-sm text-danger">{problem}</p> : null}
    </Dialog>
  );
}
