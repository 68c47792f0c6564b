import { describe, expect, it } from "vitest";
import type { Door, Room } from "@hushmark/floorplan";
import { EditorStore } from "../store/store.js";
import { twoRoomPlan } from "../../test/two-rooms.js";
import { addOpening } from "./openings.js";
import { addDuct, addVent } from "./marks.js";
import { deleteElements, setProperties, setWallSetting } from "./edit.js";
import { copyElements, pasteClip } from "./clipboard.js";
import { splitEdge, deleteVertex } from "./rooms.js";

function storeWithDoor() {
  const store = new EditorStore(twoRoomPlan());
  store.run(addOpening("door", "d1", "west:west-v2", 1));
  store.run(addVent("g1", "west", { x: 1, y: 1 }));
  store.run(addVent("g2", "east", { x: 6, y: 1 }));
  store.run(addDuct("duct1", "g1", "g2"));
  return store;
}

describe("delete", () => {
  it("deleting a room takes its doors, grilles and the duct on them", () => {
    const store = storeWithDoor();
    store.run(setWallSetting("east:east-v4|west:west-v2", { constructionId: "concrete-100" }));
    store.run(deleteElements(["west"], store.plan));
    expect(Object.keys(store.plan.elements).sort()).toEqual(["east", "g2", "ground"]);
    expect(store.plan.wallSettings).toEqual({});
    store.undo();
    expect(store.plan.elements.d1).toBeDefined();
    expect(store.plan.elements.duct1).toBeDefined();
  });
});

describe("copy and paste", () => {
  it("pastes a room with its door under fresh ids, the door re-hosted on the copy", () => {
    const store = storeWithDoor();
    const clip = copyElements(store.plan, ["west"]);
    expect(clip.elements.map((e) => e.id).sort()).toEqual(["d1", "duct1", "g1", "west"]);
    const { cmd, newIds } = pasteClip(clip, { x: 0, y: 5 }, "ground", store.ids);
    store.run(cmd);
    // The duct needs both grilles; only one came along, so it is left out.
    expect(newIds).toHaveLength(3);
    const room = Object.values(store.plan.elements).find((e) => e.type === "room" && newIds.includes(e.id)) as Room;
    expect(room.outline[0]).toMatchObject({ x: 0, y: 5 });
    const door = Object.values(store.plan.elements).find((e) => e.type === "door" && newIds.includes(e.id)) as Door;
    expect(door.wallRef).toBe(`${room.id}:west-v2`);
  });
});

describe("properties", () => {
  it("sets and clears fields on one element", () => {
    const store = storeWithDoor();
    store.run(setProperties("west", { name: "Consulting room", target: { kind: "nc", nc: 30 } }));
    expect(store.plan.elements.west).toMatchObject({ name: "Consulting room", target: { kind: "nc", nc: 30 } });
    store.run(setProperties("west", { target: undefined }));
    expect("target" in store.plan.elements.west!).toBe(false);
  });

  it("a wall setting emptied of fields disappears", () => {
    const store = storeWithDoor();
    store.run(setWallSetting("p", { thicknessM: 0.2 }));
    store.run(setWallSetting("p", { thicknessM: undefined }));
    expect(store.plan.wallSettings).toEqual({});
  });
});

describe("corners", () => {
  it("splitting an edge moves openings beyond the split onto the new edge, where they stay put", () => {
    const store = storeWithDoor();
    store.run(splitEdge("west", "west-v2", { x: 4, y: 0.5 }, "west-v9"));
    const door = store.plan.elements.d1 as Door;
    expect(door.wallRef).toBe("west:west-v9");
    expect(door.offsetM).toBeCloseTo(0.5);
    expect((store.plan.elements.west as Room).outline.map((v) => v.id)).toEqual(["west-v1", "west-v2", "west-v9", "west-v3", "west-v4"]);
  });

  it("will not leave a room with fewer than three corners", () => {
    const store = new EditorStore(twoRoomPlan());
    store.run(deleteVertex("west", "west-v1"));
    expect((store.plan.elements.west as Room).outline).toHaveLength(3);
    expect(store.run(deleteVertex("west", "west-v2"))).toBeNull();
  });
});
