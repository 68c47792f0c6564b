import { command, type Command } from "@hushmark/editor-core";
import { planWithDxfImport, type DxfImport, type Plan } from "@hushmark/floorplan";
import { planWithIfcImport, type IfcImport } from "@hushmark/floorplan/ifc";

/** One undoable edit adding the imported rooms and openings (ids made unique against the plan as it is now). */
export function importDxfCommand(plan: Plan, imported: DxfImport): Command | { problem: string } {
  const merged = planWithDxfImport(plan, imported);
  if (!merged.ok) return { problem: merged.problem.message };
  const added = Object.values(merged.plan.elements).filter((e) => !plan.elements[e.id]);
  const rooms = added.filter((e) => e.type === "room").length;
  return command("exchange.import-dxf", `import ${rooms} room${rooms === 1 ? "" : "s"} from DXF`, (draft) => {
    for (const el of added) draft.elements[el.id] = structuredClone(el);
  });
}

/** One undoable edit adding the imported levels, rooms, walls, doors and windows (ids made unique against the plan as it is now). */
export function importIfcCommand(plan: Plan, imported: IfcImport): Command | { problem: string } {
  const merged = planWithIfcImport(plan, imported);
  if (!merged.ok) return { problem: merged.problem.message };
  const added = Object.values(merged.plan.elements).filter((e) => !plan.elements[e.id]);
  const rooms = added.filter((e) => e.type === "room").length;
  return command("exchange.import-ifc", `import ${rooms} room${rooms === 1 ? "" : "s"} from IFC`, (draft) => {
    for (const el of added) draft.elements[el.id] = structuredClone(el);
  });
}
