import { describe, expect, it } from "vitest";
import { constructionCatalogue, validatePlan } from "@hushmark/floorplan";
import { EditorStore } from "./store.js";
import { newPlan } from "../commands/new-plan.js";
import { addRoomRectangle } from "../commands/rooms.js";
import { moveElements, setProperties } from "../commands/edit.js";

const room = (id: string) => ({ id, levelId: "ground", name: id });

describe("EditorStore", () => {
  it("freezes a plan it is given, so a loaded plan cannot be changed behind the history's back", () => {
    const plan = newPlan("p", "Plan");
    const store = new EditorStore(plan);
    expect(Object.isFrozen(store.plan.elements)).toBe(true);
    expect(Object.isFrozen(store.plan.elements["ground"])).toBe(true);
    const other = newPlan("q", "Other");
    store.load(other);
    expect(Object.isFrozen(store.plan.elements)).toBe(true);
  });

  it("records a command with patches and takes it back on undo, forward on redo", () => {
    const store = new EditorStore(newPlan("p", "P"));
    const before = store.plan;
    const entry = store.run(addRoomRectangle(room("a"), { x: 0, y: 0 }, { x: 4, y: 3 }));
    expect(entry?.label).toBe("add room");
    expect(entry?.patches.length).toBeGreaterThan(0);
    const after = store.plan;
    expect(after.elements.a?.type).toBe("room");
    expect(store.undo()).toBe(true);
    expect(store.plan).toEqual(before);
    expect(store.plan.elements.a).toBeUndefined();
    expect(store.redo()).toBe(true);
    expect(store.plan).toEqual(after);
    expect(store.redo()).toBe(false);
  });

  it("does not record a command that changes nothing", () => {
    const store = new EditorStore(newPlan("p", "P"));
    expect(store.run(setProperties("missing", { name: "x" }))).toBeNull();
    expect(store.historySize.past).toBe(0);
  });

  it("a new edit after undo drops the redo stack", () => {
    const store = new EditorStore(newPlan("p", "P"));
    store.run(addRoomRectangle(room("a"), { x: 0, y: 0 }, { x: 1, y: 1 }));
    store.undo();
    store.run(addRoomRectangle(room("b"), { x: 0, y: 0 }, { x: 1, y: 1 }));
    expect(store.redo()).toBe(false);
    expect(Object.keys(store.plan.elements).sort()).toEqual(["b", "ground"]);
  });

  it("previews a drag from the mark without recording, and commits one entry", () => {
    const store = new EditorStore(newPlan("p", "P"));
    store.run(addRoomRectangle(room("a"), { x: 0, y: 0 }, { x: 4, y: 3 }));
    const base = store.plan;
    store.begin();
    for (let i = 1; i <= 10; i++) store.preview(moveElements(["a"], { x: i * 0.1, y: 0 }, base));
    // Each preview starts from the mark, so ten moves of growing size end at the last one, not their sum.
    const room0 = store.plan.elements.a;
    expect(room0?.type === "room" && room0.outline[0]?.x).toBeCloseTo(1.0);
    expect(store.historySize.past).toBe(1);
    store.commit();
    expect(store.historySize.past).toBe(2);
    store.undo();
    expect(store.plan).toEqual(base);
  });

  it("rolls a drag back to the mark on Escape", () => {
    const store = new EditorStore(newPlan("p", "P"));
    store.run(addRoomRectangle(room("a"), { x: 0, y: 0 }, { x: 4, y: 3 }));
    const base = store.plan;
    store.begin();
    store.preview(moveElements(["a"], { x: 2, y: 2 }, base));
    expect(store.plan).not.toBe(base);
    store.rollback();
    expect(store.plan).toBe(base);
    expect(store.historySize.past).toBe(1);
  });

  it("keeps selection out of history and drops selected ids that undo removes", () => {
    const store = new EditorStore(newPlan("p", "P"));
    store.run(addRoomRectangle(room("a"), { x: 0, y: 0 }, { x: 4, y: 3 }));
    store.select(["a"]);
    expect(store.historySize.past).toBe(1);
    store.undo();
    expect(store.selection).toEqual([]);
  });

  it("a load from the server replaces the plan and clears history without counting as an edit", () => {
    const store = new EditorStore(newPlan("p", "P"));
    store.run(addRoomRectangle(room("a"), { x: 0, y: 0 }, { x: 4, y: 3 }));
    const edits = store.edits;
    store.load(newPlan("p", "Theirs"));
    expect(store.plan.name).toBe("Theirs");
    expect(store.edits).toBe(edits);
    expect(store.undo()).toBe(false);
    expect(store.lastChange).toBe("load");
  });

  it("makes plans the plan model accepts", () => {
    const store = new EditorStore(newPlan("p", "P"));
    store.run(addRoomRectangle(room("a"), { x: 0, y: 0 }, { x: 4, y: 3 }));
    const errors = validatePlan(store.plan, constructionCatalogue).filter((p) => p.severity === "error");
    expect(errors).toEqual([]);
  });

  it("hands out ids that skip ones already in the plan", () => {
    const store = new EditorStore(newPlan("p", "P"));
    store.run(addRoomRectangle(room("room-1"), { x: 0, y: 0 }, { x: 1, y: 1 }));
    expect(store.ids.next("room")).toBe("room-2");
    expect(store.ids.next("room")).toBe("room-3");
  });
});
