import { constructionCatalogue } from "@hushmark/floorplan";
import type { IfcImportReport } from "@hushmark/floorplan/ifc";

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
const m2 = (v: number) => `${v.toFixed(2)} m²`;
const HEIGHT_FROM: Record<IfcImportReport["levels"][number]["heightFrom"], string> = {
  spaces: "from its tallest space",
  "next storey": "up to the next storey",
  walls: "from its tallest wall",
  none: "not found: set it on the level",
};

/** What the IFC import made (levels, rooms with both areas, walls with their constructions) and what it left out. */
export function IfcReportView({ report }: { report: IfcImportReport }) {
  const c = report.converted;
  const bySet = new Map<string, { walls: number; constructionId: string }>();
  for (const w of report.wallLayers) {
    const key = w.layerSetKey ?? "no material layers";
    const s = bySet.get(key) ?? { walls: 0, constructionId: w.constructionId };
    s.walls++;
    bySet.set(key, s);
  }
  return (
    <div className="flex flex-col gap-2 text-sm" aria-label="Import report">
      <p>
        <strong>{plural(c.rooms, "room")}</strong>, {plural(c.walls, "wall")}, {plural(c.doors, "door")}, {plural(c.windows, "window")} on {plural(report.levels.length, "level")}
        , from {report.schema} in {report.lengthUnit.name}s.
      </p>
      <ul className="list-disc pl-5">
        {report.levels.map((l) => (
          <li key={l.levelId}>
            {l.name}{l.added ? " (new level)" : " (onto an existing level)"}: floor at {l.elevationM.toFixed(2)} m, height {l.heightM !== undefined ? `${l.heightM.toFixed(2)} m` : "—"} {HEIGHT_FROM[l.heightFrom]}
          </li>
        ))}
      </ul>
      {report.rooms.length > 0 ? (
        <table className="text-sm">
          <thead><tr><th className="text-left">Room</th><th className="text-right">In the file</th><th className="text-right">On the plan</th></tr></thead>
          <tbody>
            {report.rooms.map((r) => (
              <tr key={r.roomId}><td>{r.name}</td><td className="text-right tabular-nums">{m2(r.ifcAreaM2)}</td><td className="text-right tabular-nums">{m2(r.planAreaM2)}</td></tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {report.rooms.some((r) => r.edgesMoved > 0) ? <p className="text-muted">The file's spaces stop at the wall faces; on the plan, room edges run along the wall centrelines, so the areas are larger.</p> : null}
      {bySet.size > 0 ? (
        <ul className="list-disc pl-5">
          {[...bySet].map(([key, s]) => <li key={key}>{plural(s.walls, "wall")} of {key}: {constructionCatalogue.constructions[s.constructionId]?.name ?? s.constructionId}</li>)}
        </ul>
      ) : null}
      {report.skipped.length > 0 ? (
        <div>
          <p className="font-medium">Left out</p>
          <ul className="list-disc pl-5">{report.skipped.map((l) => <li key={l.reason}>{l.count} × {l.reason}{l.handles.length ? ` (e.g. ${l.handles[0]})` : ""}</li>)}</ul>
        </div>
      ) : null}
    </div>
  );
}
