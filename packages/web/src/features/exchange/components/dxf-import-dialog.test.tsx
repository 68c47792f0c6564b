import { fireEvent, render, screen } from "@testing-library/react";
import { produce } from "immer";
import { describe, expect, it, vi } from "vitest";
import type { Command } from "@hushmark/editor-core";
import { elementsOfType, emptyPlan, fernhollowStudioPlan, planToDxf, validatePlan, constructionCatalogue } from "@hushmark/floorplan";
import { inlineDxfRunner } from "../model/dxf-runner";
import { DxfImportDialog } from "./dxf-import-dialog";

const target = () => emptyPlan({ id: "survey", name: "Invented survey" });

function choose(text: string, name = "drawing.dxf") {
  const input = document.querySelector('input[type="file"]') as HTMLInputElement;
  fireEvent.change(input, { target: { files: [new File([text], name)] } });
}

describe("DxfImportDialog", () => {
  it("maps layers, converts with progress, reports and adds the rooms as one edit", async () => {
    const plan = target();
    const onCommand = vi.fn<(c: Command) => void>();
    render(<DxfImportDialog open onClose={() => {}} plan={plan} levelId="level-0" onCommand={onCommand} runner={inlineDxfRunner()} />);
    choose(planToDxf(fernhollowStudioPlan(), { levelId: "ground" }));
    const wallsLayer = (await screen.findByLabelText("Layer walls")) as HTMLSelectElement;
    // The wall outlines at thickness would become thin rooms: leave them out, keep the room outlines.
    expect(wallsLayer.value).toBe("walls");
    fireEvent.change(wallsLayer, { target: { value: "ignore" } });
    expect((screen.getByLabelText("Layer doors") as HTMLSelectElement).value).toBe("doors");
    expect(screen.getByText(/Drawn in metres/)).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Convert" }));
    expect(await screen.findByText("4 rooms")).toBeTruthy();
    expect(screen.getByLabelText("Import report").textContent).toMatch(/2 doors, 1 window/);
    fireEvent.click(screen.getByRole("button", { name: "Add to plan" }));
    expect(onCommand).toHaveBeenCalledTimes(1);
    const cmd = onCommand.mock.calls[0]![0];
    const next = produce(plan, cmd.recipe);
    expect(elementsOfType(next, "room").map((r) => r.name).sort()).toEqual(["Café (counter and grinder)", "Café back room (condenser)", "Control room", "Recording room"]);
    expect(elementsOfType(next, "door")).toHaveLength(2);
    expect(validatePlan(next, constructionCatalogue).filter((p) => p.severity === "error")).toEqual([]);
    expect(cmd.label).toBe("import 4 rooms from DXF");
  });

  it("asks for the units when the drawing has none", async () => {
    const text = planToDxf(fernhollowStudioPlan(), { levelId: "ground" }).replace("$INSUNITS\n70\n6\n", "$INSUNITS\n70\n0\n");
    render(<DxfImportDialog open onClose={() => {}} plan={target()} levelId="level-0" onCommand={() => {}} runner={inlineDxfRunner()} />);
    choose(text);
    expect(await screen.findByText(/marked unitless/)).toBeTruthy();
    const select = screen.getByRole("combobox", { name: /Units/ }) as HTMLSelectElement;
    expect(select.required).toBe(true);
    fireEvent.change(select, { target: { value: "metres" } });
    fireEvent.change(screen.getByLabelText("Layer walls"), { target: { value: "ignore" } });
    fireEvent.click(screen.getByRole("button", { name: "Convert" }));
    expect(await screen.findByText(/metres \(chosen\)/)).toBeTruthy();
  });

  it("says what is wrong with a damaged file and adds nothing", async () => {
    const onCommand = vi.fn();
    render(<DxfImportDialog open onClose={() => {}} plan={target()} levelId="level-0" onCommand={onCommand} runner={inlineDxfRunner()} />);
    choose("Kitchen 3.2 x 4.1\nHall\n", "notes.dxf");
    expect((await screen.findByRole("alert")).textContent).toMatch(/expected a group code/);
    expect(screen.queryByRole("button", { name: "Add to plan" })).toBeNull();
    expect(onCommand).not.toHaveBeenCalled();
  });
});
