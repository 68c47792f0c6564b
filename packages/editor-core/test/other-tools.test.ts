import { describe, expect, it } from "vitest";
import type { Room } from "@hushmark/floorplan";
import { ToolHarness } from "./harness.js";
import { twoRoomPlan } from "./two-rooms.js";

describe("vent and duct link", () => {
  it("places grilles in the rooms under the pointer and links them", () => {
    const h = new ToolHarness(twoRoomPlan(), "vent");
    h.click(1, 1);
    h.use("vent").click(6, 2);
    h.click(20, 20);
    const vents = h.elementsOf("vent");
    expect(vents.map((v) => v.type === "vent" && v.spaceId)).toEqual(["west", "east"]);
    h.use("duct-link").click(1, 1);
    expect(h.tool.stateName).toBe("second-grille");
    h.click(6, 2);
    const duct = h.elementsOf("duct")[0];
    expect(duct?.type === "duct" && [duct.fromVentId, duct.toVentId]).toEqual([vents[0]!.id, vents[1]!.id]);
    expect(duct?.type === "duct" && duct.lengthM).toBeCloseTo(Math.hypot(5, 1), 2);
  });
});

describe("void", () => {
  it("drags a ceiling void over both rooms", () => {
    const h = new ToolHarness(twoRoomPlan(), "void");
    h.drag([[0, 0], [8, 3]]);
    const v = h.elementsOf("void")[0];
    expect(v?.type === "void" && v.kind).toBe("ceiling-void");
    expect(v?.type === "void" && v.outline.length).toBe(4);
  });
});

describe("corners tool", () => {
  it("drags a corner with snapping, one history entry, Escape restores", () => {
    const h = new ToolHarness(twoRoomPlan(), "corners");
    const past = h.store.historySize.past;
    h.drag([[0, 0], [-0.98, -1.02]]);
    expect((h.plan.elements.west as Room).outline[0]).toMatchObject({ x: -1, y: -1 });
    expect(h.store.historySize.past).toBe(past + 1);
    const before = h.plan;
    h.drag([[-1, -1], [-3, -3]], {}, { release: false });
    h.press("Escape");
    expect(h.plan).toBe(before);
  });

  it("clicking a wall line adds a corner there", () => {
    const h = new ToolHarness(twoRoomPlan(), "corners");
    h.click(2, 3);
    expect((h.plan.elements.west as Room).outline).toHaveLength(5);
  });
});

describe("pin, note, tape, pan", () => {
  it("a pin knows the room it is in", () => {
    const h = new ToolHarness(twoRoomPlan(), "pin");
    h.click(6, 1);
    expect(h.elementsOf("pin")[0]).toMatchObject({ spaceId: "east", label: "M1" });
  });

  it("a note is placed empty and selected for typing", () => {
    const h = new ToolHarness(twoRoomPlan(), "note");
    h.click(2, 2);
    const n = h.elementsOf("note")[0]!;
    expect(h.store.selection).toEqual([n.id]);
  });

  it("tape measures without changing the plan", () => {
    const h = new ToolHarness(twoRoomPlan(), "tape");
    const before = h.plan;
    h.click(0, 0).click(4, 3);
    expect(h.tool.overlay.dims?.[0]?.text).toBe("5.00 m");
    expect(h.plan).toBe(before);
  });

  it("pan keeps the grab point under the pointer", () => {
    const h = new ToolHarness(twoRoomPlan(), "pan");
    h.tool.down({ point: { x: 1, y: 1 } });
    h.tool.move({ point: { x: 3, y: 2 } });
    h.tool.up({ point: { x: 3, y: 2 } });
    expect(h.panned).toEqual({ x: 2, y: 1 });
  });
});

describe("inspect (read-only views)", () => {
  it("a click selects, a drag pans, and the plan never changes", async () => {
    const { InspectTool } = await import("../src/tools/inspect/inspect-tool.js");
    const h = new ToolHarness(twoRoomPlan());
    const before = h.plan;
    h.tool = new InspectTool(h.env);
    h.click(6, 1.5);
    expect(h.store.selection).toEqual(["east"]);
    h.drag([[2, 2], [3, 2.5]]);
    expect(h.panned.x).toBeGreaterThan(0);
    expect(h.plan).toBe(before);
    expect(h.store.selection).toEqual(["east"]);
  });
});
