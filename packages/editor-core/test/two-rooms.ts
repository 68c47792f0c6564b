import type { Plan } from "@hushmark/floorplan";
import { EditorStore } from "../src/store/store.js";
import { newPlan } from "../src/commands/new-plan.js";
import { addRoomRectangle } from "../src/commands/rooms.js";

/** Two rooms side by side sharing the wall x = 4 (each 4 × 3 m). */
export function twoRoomPlan(): Plan {
  const store = new EditorStore(newPlan("two", "Two rooms"));
  store.run(addRoomRectangle({ id: "west", levelId: "ground", name: "West" }, { x: 0, y: 0 }, { x: 4, y: 3 }));
  store.run(addRoomRectangle({ id: "east", levelId: "ground", name: "East" }, { x: 4, y: 0 }, { x: 8, y: 3 }));
  return store.plan;
}
