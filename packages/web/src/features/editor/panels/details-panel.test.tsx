import { fireEvent, render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { EditorStore, addOpening, addRoomRectangle, newPlan } from "@hushmark/editor-core";
import type { Door } from "@hushmark/floorplan";
import { DetailsPanel } from "./details-panel";
import { ElementTable } from "../components/element-table";

function storeWithDoor() {
  const store = new EditorStore(newPlan("p", "Plan"));
  store.run(addRoomRectangle({ id: "west", levelId: "ground", name: "Waiting room" }, { x: 0, y: 0 }, { x: 4, y: 3 }));
  store.run(addRoomRectangle({ id: "east", levelId: "ground", name: "Consulting room" }, { x: 4, y: 0 }, { x: 8, y: 3 }));
  store.run(addOpening("door", "door-1", "west:west-v2", 1));
  return store;
}

describe("details panel", () => {
  it("edits a door's undercut as one step when the field is committed, not per keystroke", () => {
    const store = storeWithDoor();
    store.select(["door-1"]);
    render(<DetailsPanel plan={store.plan} selection={store.selection} store={store} problems={[]} />);
    const before = store.historySize.past;
    const undercut = screen.getByLabelText("Undercut");
    fireEvent.focus(undercut);
    fireEvent.change(undercut, { target: { value: "1" } });
    fireEvent.change(undercut, { target: { value: "12" } });
    expect(store.historySize.past).toBe(before);
    fireEvent.keyDown(undercut, { key: "Enter" });
    expect((store.plan.elements["door-1"] as Door).leaks?.undercutMm).toBe(12);
    expect(store.historySize.past).toBe(before + 1);
  });

  it("shows the fire caution for a door and the problems of the selection", () => {
    const store = storeWithDoor();
    store.select(["door-1"]);
    render(<DetailsPanel plan={store.plan} selection={store.selection} store={store} problems={[{ code: "opening-wider-than-wall", severity: "error", elementId: "door-1", message: "Too wide", suggestion: "Measure again" }]} />);
    expect(screen.getByText("Too wide")).toBeTruthy();
    expect(within(screen.getByLabelText("Cautions")).getByText(/Fire-rated assemblies/)).toBeTruthy();
  });

  it("lists the catalogue with ratings and filters it by search", () => {
    const store = storeWithDoor();
    store.select(["door-1"]);
    render(<DetailsPanel plan={store.plan} selection={store.selection} store={store} problems={[]} />);
    fireEvent.click(screen.getByRole("button", { name: /^Construction/ }));
    const list = screen.getByRole("listbox");
    const all = within(list).getAllByRole("option").length;
    expect(all).toBeGreaterThan(2);
    expect(within(list).getAllByText(/STC \d+/).length).toBe(all);
    fireEvent.change(screen.getByRole("searchbox"), { target: { value: "solid core sealed" } });
    expect(within(list).getAllByRole("option")).toHaveLength(1);
    fireEvent.click(within(list).getByRole("button"));
    expect((store.plan.elements["door-1"] as Door).constructionId).toBe("door-solid-core-sealed");
  });
});

describe("element table", () => {
  it("lists rooms, the door and the wall pieces, and selects and renames from the keyboard", () => {
    const store = storeWithDoor();
    render(<ElementTable plan={store.plan} levelId="ground" selection={[]} store={store} />);
    const table = screen.getByRole("table", { name: "Elements on this level" });
    expect(within(table).getByRole("button", { name: /^Select Wall between (Waiting room and Consulting room|Consulting room and Waiting room)$/ })).toBeTruthy();
    fireEvent.click(within(table).getByRole("button", { name: "Select Waiting room" }));
    expect(store.selection).toEqual(["west"]);
    const name = within(table).getByRole("textbox", { name: "Name of Waiting room" });
    fireEvent.change(name, { target: { value: "Reception" } });
    fireEvent.blur(name);
    expect(store.plan.elements.west).toMatchObject({ name: "Reception" });
  });

  it("offers no edits to someone reading the plan", () => {
    const store = storeWithDoor();
    render(<ElementTable plan={store.plan} levelId="ground" selection={[]} store={store} readOnly />);
    expect(screen.queryAllByRole("textbox")).toHaveLength(0);
    expect(screen.queryAllByRole("button", { name: /^Delete/ })).toHaveLength(0);
    expect(screen.getAllByRole("button", { name: /^Select/ }).length).toBeGreaterThan(3);
  });
});

describe("duplicate", () => {
  it("copies a room with its door beside the original, selecting the copy", () => {
    const store = storeWithDoor();
    store.select(["west"]);
    render(<DetailsPanel plan={store.plan} selection={store.selection} store={store} problems={[]} />);
    fireEvent.click(screen.getByRole("button", { name: "Duplicate Waiting room" }));
    const rooms = Object.values(store.plan.elements).filter((e) => e.type === "room");
    const doors = Object.values(store.plan.elements).filter((e) => e.type === "door");
    expect(rooms).toHaveLength(3);
    expect(doors).toHaveLength(2);
    const copy = store.plan.elements[store.selection[0]!];
    expect(copy?.type === "room" && copy.outline[0]).toMatchObject({ x: 0.5, y: -0.5 });
  });
});
