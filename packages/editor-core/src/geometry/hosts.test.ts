import { describe, expect, it } from "vitest";
import { EditorStore } from "../store/store.js";
import { addRoomRectangle } from "../commands/rooms.js";
import { newPlan } from "../commands/new-plan.js";
import { hostOf, wallHosts } from "./hosts.js";

describe("wall hosts", () => {
  it("finds a room edge by its ref, and finds the edges of a room added later", () => {
    const store = new EditorStore(newPlan("p", "Plan"));
    store.run(addRoomRectangle({ id: "west", levelId: "ground", name: "West" }, { x: 0, y: 0 }, { x: 4, y: 3 }));
    const refs = wallHosts(store.plan).map((h) => h.ref);
    expect(refs).toHaveLength(4);
    const host = hostOf(store.plan, refs[1]!);
    expect(host?.ownerId).toBe("west");
    expect(host?.lengthM).toBeGreaterThan(2.9);
    expect(hostOf(store.plan, "west:nope")).toBeUndefined();
    store.run(addRoomRectangle({ id: "east", levelId: "ground", name: "East" }, { x: 4, y: 0 }, { x: 8, y: 3 }));
    expect(wallHosts(store.plan)).toHaveLength(8);
    const eastRef = wallHosts(store.plan).find((h) => h.ownerId === "east")!.ref;
    expect(eastRef.startsWith("east:")).toBe(true);
    expect(hostOf(store.plan, eastRef)?.ownerId).toBe("east");
  });
});
