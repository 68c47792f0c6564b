import { describe, expect, it } from "vitest";
import { constructionCatalogue, openingPlacement, planWallPieces, validatePlan, type Door, type Window } from "@hushmark/floorplan";
import { ToolHarness } from "./harness.js";
import { twoRoomPlan } from "./two-rooms.js";
import { setLeaks } from "../src/commands/openings.js";

describe("door and window tools", () => {
  it("puts a door on the shared wall, centred on the click, and the plan model places it there", () => {
    const h = new ToolHarness(twoRoomPlan(), "door");
    h.hover(4.02, 1.5);
    expect(h.tool.overlay.ghost?.kind).toBe("door");
    h.click(4.02, 1.5);
    const door = h.elementsOf("door")[0] as Door;
    expect(door.offsetM).toBeCloseTo(1.5 - door.widthM / 2);
    const placed = openingPlacement(h.plan, planWallPieces(h.plan), door, 0.05);
    expect(placed.ok && placed.hostId.includes("|")).toBe(true);
    expect(h.store.selection).toEqual([door.id]);
    expect(h.doneCount).toBe(1);
  });

  it("keeps an opening inside its wall when clicked near a corner", () => {
    const h = new ToolHarness(twoRoomPlan(), "window");
    h.click(0.1, 0);
    const w = h.elementsOf("window")[0] as Window;
    expect(w.offsetM).toBe(0);
    expect(validatePlan(h.plan, constructionCatalogue).filter((p) => p.elementId === w.id && p.severity === "error")).toEqual([]);
  });

  it("refuses a click away from any wall", () => {
    const h = new ToolHarness(twoRoomPlan(), "door");
    h.click(2, 1.5);
    expect(h.elementsOf("door")).toHaveLength(0);
    expect(h.tool.overlay.hint).toMatch(/not on a wall/);
  });

  it("leaks are edited and undone like everything else", () => {
    const h = new ToolHarness(twoRoomPlan(), "door");
    h.click(4, 1.5);
    const id = h.elementsOf("door")[0]!.id;
    h.store.run(setLeaks(id, { undercutMm: 12 }));
    expect((h.plan.elements[id] as Door).leaks?.undercutMm).toBe(12);
    h.store.undo();
    expect((h.plan.elements[id] as Door).leaks?.undercutMm).toBe(0);
  });

  it("a gap is a penetration on the wall", () => {
    const h = new ToolHarness(twoRoomPlan(), "gap");
    h.click(4, 2);
    expect(h.elementsOf("penetration")).toHaveLength(1);
  });
});
