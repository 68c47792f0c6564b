import { describe, expect, it } from "vitest";
import { hitTest, hitTestAll, roomAt } from "./hit-test.js";
import { elementBounds, planBounds } from "./bounds.js";
import { EditorStore } from "../store/store.js";
import { addOpening } from "../commands/openings.js";
import { addPin } from "../commands/marks.js";
import { twoRoomPlan } from "../../test/two-rooms.js";

function plan() {
  const store = new EditorStore(twoRoomPlan());
  store.run(addOpening("door", "d1", "west:west-v2", 1));
  store.run(addPin("p1", "ground", { x: 2, y: 2 }, "M1"));
  return store.plan;
}

describe("hit-testing", () => {
  it("prefers marks, then openings, then corners, then wall lines, then room interiors", () => {
    const p = plan();
    expect(hitTest(p, "ground", { x: 2, y: 2 }, 0.1)?.elementId).toBe("p1");
    expect(hitTest(p, "ground", { x: 4, y: 1.4 }, 0.1)?.elementId).toBe("d1");
    expect(hitTest(p, "ground", { x: 0.02, y: 0 }, 0.1)).toMatchObject({ elementId: "west", vertexId: "west-v1" });
    expect(hitTest(p, "ground", { x: 2, y: 0.03 }, 0.1)).toMatchObject({ elementId: "west", edgeRef: "west:west-v1" });
    expect(hitTest(p, "ground", { x: 1, y: 1 }, 0.1)).toMatchObject({ elementId: "west", type: "room" });
    expect(hitTest(p, "ground", { x: 10, y: 10 }, 0.1)).toBeNull();
  });

  it("only sees the level asked for", () => {
    expect(hitTestAll(plan(), "first", { x: 1, y: 1 }, 0.1)).toEqual([]);
  });

  it("finds the room a point lies in", () => {
    expect(roomAt(plan(), "ground", { x: 6, y: 1 })).toBe("east");
    expect(roomAt(plan(), "ground", { x: 9, y: 1 })).toBeNull();
  });
});

describe("bounds", () => {
  it("rooms include half the wall thickness; the plan spans everything", () => {
    const p = plan();
    const t = p.defaults.wallThicknessM / 2;
    expect(elementBounds(p, "west")).toEqual({ minX: -t, minY: -t, maxX: 4 + t, maxY: 3 + t });
    expect(planBounds(p)).toMatchObject({ minX: -t, maxX: 8 + t });
    expect(planBounds(newEmpty())).toBeNull();
  });
});

function newEmpty() {
  const p = twoRoomPlan();
  return { ...p, elements: { ground: p.elements.ground! } };
}
