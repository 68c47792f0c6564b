import { describe, expect, it } from "vitest";
import { constructionCatalogue, planWallPieces, sharedWalls, validatePlan, type Room } from "@hushmark/floorplan";
import { ToolHarness } from "./harness.js";

const corners = (r: Room) => r.outline.map((v) => [v.x, v.y]);

describe("room by rectangle", () => {
  it("drags a room out, snapped to the grid, and selects it", () => {
    const h = new ToolHarness(undefined, "room-rectangle");
    h.drag([[0.02, 0.04], [3.97, 3.03]]);
    const rooms = h.elementsOf("room") as Room[];
    expect(rooms).toHaveLength(1);
    expect(corners(rooms[0]!)).toEqual([[0, 0], [4, 0], [4, 3], [0, 3]]);
    expect(h.store.selection).toEqual([rooms[0]!.id]);
    expect(h.tool.stateName).toBe("idle");
  });

  it("also works by two clicks", () => {
    const h = new ToolHarness(undefined, "room-rectangle");
    h.click(1, 1);
    expect(h.tool.stateName).toBe("sizing");
    h.hover(3, 2).click(3, 2);
    expect(corners(h.elementsOf("room")[0] as Room)).toEqual([[1, 1], [3, 1], [3, 2], [1, 2]]);
  });

  it("a second room drawn against the first shares its wall", () => {
    const h = new ToolHarness(undefined, "room-rectangle");
    h.drag([[0, 0], [4, 3]]);
    h.drag([[4.05, 0.05], [7.5, 3.04]]);
    const shared = sharedWalls(planWallPieces(h.plan));
    expect(shared).toHaveLength(1);
    expect(shared[0]!.lengthM).toBeCloseTo(3);
    expect(validatePlan(h.plan, constructionCatalogue).filter((p) => p.severity === "error")).toEqual([]);
  });

  it("takes an exact typed size in the direction of the drag", () => {
    const h = new ToolHarness(undefined, "room-rectangle");
    h.drag([[2, 2], [0.5, 0.7]], {}, { release: false });
    h.type("3.25 x 2.4");
    expect(h.tool.overlay.typed).toBe("3.25 x 2.4");
    h.press("Enter");
    expect(corners(h.elementsOf("room")[0] as Room)).toEqual([[-1.25, -0.4], [2, -0.4], [2, 2], [-1.25, 2]]);
  });

  it("reads typed feet and inches in an imperial plan", () => {
    const h = new ToolHarness(undefined, "room-rectangle", { unit: "imperial" });
    h.drag([[0, 0], [1, 1]], {}, { release: false });
    h.type("12' x 10'6\"");
    h.press("Enter");
    const r = h.elementsOf("room")[0] as Room;
    expect(r.outline[1]!.x).toBeCloseTo(3.658, 3);
    expect(r.outline[2]!.y).toBeCloseTo(3.2, 3);
  });

  it("Escape drops the half-drawn rectangle", () => {
    const h = new ToolHarness(undefined, "room-rectangle");
    h.drag([[0, 0], [2, 2]], {}, { release: false });
    expect(h.press("Escape")).toBe(true);
    h.tool.up({ point: { x: 2, y: 2 } });
    expect(h.elementsOf("room")).toHaveLength(0);
  });

  it("shows the sizes being drawn", () => {
    const h = new ToolHarness(undefined, "room-rectangle");
    h.drag([[0, 0], [4, 3]], {}, { release: false });
    expect(h.tool.overlay.dims?.map((d) => d.text)).toEqual(["4.00 m", "3.00 m"]);
  });
});

describe("room by polygon", () => {
  it("clicks an L-shaped room and closes on the first corner", () => {
    const h = new ToolHarness(undefined, "room-polygon");
    for (const [x, y] of [[0, 0], [6, 0], [6, 2], [3, 2], [3, 5], [0, 5]] as const) h.click(x, y);
    h.click(0.05, 0.05);
    const r = h.elementsOf("room")[0] as Room;
    expect(corners(r)).toEqual([[0, 0], [6, 0], [6, 2], [3, 2], [3, 5], [0, 5]]);
    expect(new Set(r.outline.map((v) => v.id)).size).toBe(6);
  });

  it("places the next corner at a typed length along the pointer's direction", () => {
    const h = new ToolHarness(undefined, "room-polygon");
    h.click(0, 0);
    h.hover(2, 0.01);
    h.type("3.6");
    h.press("Enter");
    h.hover(3.6, 2);
    h.type("2.5");
    h.press("Enter");
    h.click(0, 2.5);
    h.press("Enter");
    expect(corners(h.elementsOf("room")[0] as Room)).toEqual([[0, 0], [3.6, 0], [3.6, 2.5], [0, 2.5]]);
  });

  it("Backspace takes back the last corner; fewer than three corners make no room", () => {
    const h = new ToolHarness(undefined, "room-polygon");
    h.click(0, 0).click(2, 0).click(2, 2);
    h.press("Backspace");
    expect(h.tool.overlay.path).toHaveLength(3);
    h.press("Enter");
    expect(h.elementsOf("room")).toHaveLength(0);
  });
});

describe("free wall", () => {
  it("draws a chain of walls, each starting where the last ended", () => {
    const h = new ToolHarness(undefined, "wall");
    h.click(0, 0).click(3, 0).click(3, 2);
    h.press("Escape");
    const walls = h.elementsOf("wall");
    expect(walls).toHaveLength(2);
    expect(walls.map((w) => w.type === "wall" && [w.start, w.end])).toEqual([
      [{ x: 0, y: 0 }, { x: 3, y: 0 }],
      [{ x: 3, y: 0 }, { x: 3, y: 2 }],
    ]);
    expect(walls[0]!.type === "wall" && walls[0]!.thicknessM).toBe(h.plan.defaults.wallThicknessM);
  });

  it("takes a typed length", () => {
    const h = new ToolHarness(undefined, "wall");
    h.click(1, 1);
    h.hover(1, 4);
    h.type("2.75");
    h.press("Enter");
    const w = h.elementsOf("wall")[0];
    expect(w?.type === "wall" && w.end).toEqual({ x: 1, y: 3.75 });
  });
});
