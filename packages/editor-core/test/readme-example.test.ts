import { describe, expect, it } from "vitest";
import { EditorStore, createTool, newPlan, addRoomRectangle } from "../src/index.js";

describe("the README's example", () => {
  it("draws a room, puts a door in its east wall by pointer, and undoes it", () => {
    const store = new EditorStore(newPlan("p1", "Studio"));
    store.run(addRoomRectangle({ id: "room-1", levelId: "ground", name: "Control room" }, { x: 0, y: 0 }, { x: 6, y: 4 }));
    const tool = createTool("door", { store, levelId: "ground", unit: "metric", gridM: 0.1, toleranceM: 0.15 });
    tool.down({ point: { x: 6, y: 2 } });
    const door = Object.values(store.plan.elements).find((e) => e.type === "door");
    expect(door).toMatchObject({ wallRef: "room-1:room-1-v2" });
    expect(store.selection).toEqual([door!.id]);
    store.undo();
    expect(Object.values(store.plan.elements).some((e) => e.type === "door")).toBe(false);
  });
});
