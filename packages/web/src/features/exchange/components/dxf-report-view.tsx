import type { DxfImportReport } from "@hushmark/floorplan";

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** What the conversion made, what went to the underlay and what was left out, with reasons. */
export function DxfReportView({ report }: { report: DxfImportReport }) {
  const c = report.converted;
  const units = report.units.status === "missing" ? "" : `${report.units.name}${report.units.status === "chosen" ? " (chosen)" : " (from the drawing)"}`;
  return (
    <div className="flex flex-col gap-2 text-sm" aria-label="Import report">
      <p>
        <strong>{plural(c.rooms, "room")}</strong>, {plural(c.doors, "door")}, {plural(c.windows, "window")} from {plural(report.entitiesRead, "entity", "entities")}
        {units ? `, drawn in ${units}` : ""}; arcs within {report.chordToleranceM * 1000} mm.
      </p>
      {report.shiftM.x !== 0 || report.shiftM.y !== 0 ? <p>Moved by {-report.shiftM.x} m east and {-report.shiftM.y} m north to the plan origin.</p> : null}
      {c.underlayPaths > 0 ? <p>{plural(c.underlayPaths, "other line")} kept as underlay to trace; the editor does not show underlays yet, so they are not added to the plan.</p> : null}
      {report.toUnderlay.length > 0 ? (
        <div>
          <p className="font-medium">Not made into rooms or openings</p>
          <ul className="list-disc pl-5">{report.toUnderlay.map((l) => <li key={l.reason}>{l.count} × {l.reason}{l.handles.length ? ` (e.g. handle ${l.handles[0]})` : ""}</li>)}</ul>
        </div>
      ) : null}
      {report.skipped.length > 0 ? (
        <div>
          <p className="font-medium">Left out</p>
          <ul className="list-disc pl-5">{report.skipped.map((l) => <li key={l.reason}>{l.count} × {l.reason}</li>)}</ul>
        </div>
      ) : null}
    </div>
  );
}
