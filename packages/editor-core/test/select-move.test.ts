import { describe, expect, it } from "vitest";
import type { Door, Room } from "@hushmark/floorplan";
import { ToolHarness } from "./harness.js";
import { twoRoomPlan } from "./two-rooms.js";
import { addOpening } from "../src/commands/openings.js";

describe("select and move", () => {
  it("clicks a room to select it and empty space to clear", () => {
    const h = new ToolHarness(twoRoomPlan());
    h.click(2, 1.5);
    expect(h.store.selection).toEqual(["west"]);
    h.click(20, 20);
    expect(h.store.selection).toEqual([]);
  });

  it("clicking the shared wall selects the wall piece between the two rooms", () => {
    const h = new ToolHarness(twoRoomPlan());
    h.click(4.01, 1.5);
    expect(h.store.selection).toHaveLength(1);
    expect(h.store.selection[0]).toContain("|");
    expect(h.store.selection[0]).toContain("east:");
    expect(h.store.selection[0]).toContain("west:");
  });

  it("Shift-click builds a multi-selection", () => {
    const h = new ToolHarness(twoRoomPlan());
    h.click(2, 1.5).click(6, 1.5, { shift: true });
    expect([...h.store.selection].sort()).toEqual(["east", "west"]);
    h.click(6, 1.5, { shift: true });
    expect(h.store.selection).toEqual(["west"]);
  });

  it("drags a room as one history entry, snapped to the grid", () => {
    const h = new ToolHarness(twoRoomPlan());
    const before = h.store.historySize.past;
    h.drag([[6, 1.5], [7, 2.5], [8.03, 3.52]]);
    const east = h.plan.elements.east as Room;
    expect(east.outline[0]).toMatchObject({ x: 6, y: 2 });
    expect(h.store.historySize.past).toBe(before + 1);
    h.store.undo();
    expect((h.plan.elements.east as Room).outline[0]).toMatchObject({ x: 4, y: 0 });
  });

  it("Escape during a drag puts everything back and records nothing", () => {
    const h = new ToolHarness(twoRoomPlan());
    const before = h.plan;
    h.drag([[6, 1.5], [9, 5]], {}, { release: false });
    expect(h.plan).not.toBe(before);
    expect(h.press("Escape")).toBe(true);
    expect(h.plan).toBe(before);
    h.tool.up({ point: { x: 9, y: 5 } });
    expect(h.plan).toBe(before);
  });

  it("a door on a moved room rides along; a door dragged alone slides along its wall", () => {
    const h = new ToolHarness(twoRoomPlan());
    h.store.run(addOpening("door", "d1", "west:west-v1", 1));
    h.drag([[1.4, 0.0], [2.4, 0.6]]);
    expect((h.plan.elements.d1 as Door).offsetM).toBeCloseTo(2);
    expect((h.plan.elements.d1 as Door).wallRef).toBe("west:west-v1");
  });

  it("a box drag selects what lies wholly inside", () => {
    const h = new ToolHarness(twoRoomPlan());
    h.drag([[-1, -1], [4.5, 3.5]]);
    expect(h.store.selection).toEqual(["west"]);
  });
});
