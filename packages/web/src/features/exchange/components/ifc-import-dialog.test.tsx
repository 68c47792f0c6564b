import { fireEvent, render, screen } from "@testing-library/react";
import { produce } from "immer";
import { describe, expect, it, vi } from "vitest";
import type { Command } from "@hushmark/editor-core";
import { constructionCatalogue, elementsOfType, emptyPlan, polygonAreaM2, validatePlan } from "@hushmark/floorplan";
import { ifcReader } from "@hushmark/floorplan/ifc";
import { inlineIfcRunner } from "../model/ifc-runner";
import { IfcImportDialog } from "./ifc-import-dialog";

/**
 * An invented one-room model in IFC4 text, metres: a 4 × 3 m space at the inner faces of four
 * 0.2 m walls on centrelines round −0.1..4.1 × −0.1..3.1, the walls with a two-layer set.
 */
function oneRoomIfc(): string {
  const l: string[] = [];
  let n = 10;
  const add = (s: string) => { l.push(`#${++n}=${s};`); return `#${n}`; };
  const pt = (...c: number[]) => add(`IFCCARTESIANPOINT((${c.map((v) => v.toFixed(2)).join(",")}))`);
  const z = add("IFCDIRECTION((0.,0.,1.))");
  const o = add(`IFCAXIS2PLACEMENT3D(${pt(0, 0, 0)},$,$)`);
  const ctx = add(`IFCGEOMETRICREPRESENTATIONCONTEXT($,'Model',3,1.E-05,${o},$)`);
  const units = add(`IFCUNITASSIGNMENT((${add("IFCSIUNIT(*,.LENGTHUNIT.,$,.METRE.)")}))`);
  const project = add(`IFCPROJECT('project0000000000000000',$,'P',$,$,$,$,(${ctx}),${units})`);
  const place = (x: number, y: number, dx?: [number, number]) => add(`IFCLOCALPLACEMENT($,${add(`IFCAXIS2PLACEMENT3D(${pt(x, y, 0)},${dx ? `${z},${add(`IFCDIRECTION((${dx[0]}.,${dx[1]}.,0.))`)}` : "$,$"})`)})`);
  const shape = (profile: string, h: number) => add(`IFCPRODUCTDEFINITIONSHAPE($,$,(${add(`IFCSHAPEREPRESENTATION(${ctx},'Body','SweptSolid',(${add(`IFCEXTRUDEDAREASOLID(${profile},${o},${z},${h.toFixed(2)})`)}))`)}))`);
  const rect = (cx: number, cy: number, dx: number, dy: number) => add(`IFCRECTANGLEPROFILEDEF(.AREA.,$,${add(`IFCAXIS2PLACEMENT2D(${pt(cx, cy)},$)`)},${dx.toFixed(2)},${dy.toFixed(2)})`);
  const storey = add(`IFCBUILDINGSTOREY('storey00000000000000000',$,'Level 1',$,$,${place(0, 0)},$,$,.ELEMENT.,0.)`);
  add(`IFCRELAGGREGATES('agg0000000000000000000',$,$,$,${project},(${storey}))`);
  const space = add(`IFCSPACE('space00000000000000000',$,'R1',$,$,${place(0, 0)},${shape(rect(2, 1.5, 4, 3), 2.6)},'Practice room',.ELEMENT.,.INTERNAL.,$)`);
  add(`IFCRELAGGREGATES('agg1000000000000000000',$,$,$,${storey},(${space}))`);
  const walls = [[-0.1, -0.1, 1, 0, 4.2], [4.1, -0.1, 0, 1, 3.2], [4.1, 3.1, -1, 0, 4.2], [-0.1, 3.1, 0, -1, 3.2]].map(([x, y, ux, uy, len], i) =>
    add(`IFCWALL('wall${i}000000000000000000',$,'W${i}',$,$,${place(x!, y!, [ux!, uy!])},${shape(rect(len! / 2, 0, len!, 0.2), 2.6)},$,.STANDARD.)`));
  const set = add(`IFCMATERIALLAYERSET((${add(`IFCMATERIALLAYER(${add("IFCMATERIAL('Concrete block',$,$)")},0.19,$,$,$,$,$)`)},${add(`IFCMATERIALLAYER(${add("IFCMATERIAL('Plaster',$,$)")},0.01,$,$,$,$,$)`)}),'Block wall',$)`);
  add(`IFCRELASSOCIATESMATERIAL('mat0000000000000000000',$,$,$,(${walls.join(",")}),${set})`);
  add(`IFCRELCONTAINEDINSPATIALSTRUCTURE('rel0000000000000000000',$,$,$,(${walls.join(",")}),${storey})`);
  return ["ISO-10303-21;", "HEADER;", "FILE_DESCRIPTION((''),'2;1');", "FILE_NAME('r.ifc','',(''),(''),'','','');", "FILE_SCHEMA(('IFC4'));", "ENDSEC;", "DATA;", ...l, "ENDSEC;", "END-ISO-10303-21;", ""].join("\n");
}

function choose(text: string, name = "model.ifc") {
  const input = document.querySelector('input[type="file"]') as HTMLInputElement;
  fireEvent.change(input, { target: { files: [new File([text], name)] } });
}

describe("IfcImportDialog", () => {
  it("reads the model, lets the storey go onto an existing level and a layer set map to a construction, and adds one edit", async () => {
    const plan = emptyPlan({ id: "survey", name: "Invented survey" });
    const onCommand = vi.fn<(c: Command) => void>();
    render(<IfcImportDialog open onClose={() => {}} plan={plan} onCommand={onCommand} runner={inlineIfcRunner(() => ifcReader())} />);
    choose(oneRoomIfc());
    const onto = (await screen.findByLabelText("Level for Level 1", {}, { timeout: 5000 })) as HTMLSelectElement;
    expect(screen.getByText(/1 space, 4 walls/)).toBeTruthy();
    expect(screen.getByText(/Concrete block 190.0 mm · Plaster 10.0 mm/)).toBeTruthy();
    fireEvent.change(onto, { target: { value: "level-0" } });
    fireEvent.change(screen.getByLabelText("Construction for Block wall"), { target: { value: "masonry-brick-100" } });
    fireEvent.click(screen.getByRole("button", { name: "Convert" }));
    const report = await screen.findByLabelText("Import report");
    expect(report.textContent).toMatch(/1 room, 4 walls/);
    expect(report.textContent).toMatch(/12\.00 m²/); // the space in the file, 4 × 3 m
    expect(report.textContent).toMatch(/13\.44 m²/); // at the wall centrelines, 4.2 × 3.2 m
    fireEvent.click(screen.getByRole("button", { name: "Add to plan" }));
    expect(onCommand).toHaveBeenCalledTimes(1);
    const cmd = onCommand.mock.calls[0]![0];
    expect(cmd.label).toBe("import 1 room from IFC");
    const next = produce(plan, cmd.recipe);
    const rooms = elementsOfType(next, "room");
    expect(rooms.map((r) => [r.name, r.levelId])).toEqual([["Practice room", "level-0"]]);
    expect(polygonAreaM2(rooms[0]!.outline)).toBeCloseTo(13.44, 6);
    expect(elementsOfType(next, "wall").map((w) => w.constructionId)).toEqual(Array(4).fill("masonry-brick-100"));
    expect(elementsOfType(next, "level")).toHaveLength(1);
    expect(validatePlan(next, constructionCatalogue).filter((p) => p.severity === "error")).toEqual([]);
  });

  it("says what is wrong with a file that is not IFC and adds nothing", async () => {
    const onCommand = vi.fn();
    render(<IfcImportDialog open onClose={() => {}} plan={emptyPlan({ id: "s", name: "S" })} onCommand={onCommand} runner={inlineIfcRunner(() => ifcReader())} />);
    choose("Kitchen 3.2 x 4.1\n", "notes.ifc");
    expect((await screen.findByRole("alert")).textContent).toMatch(/ISO-10303-21/);
    expect(screen.queryByRole("button", { name: "Convert" })).toBeNull();
    expect(onCommand).not.toHaveBeenCalled();
  });
});
