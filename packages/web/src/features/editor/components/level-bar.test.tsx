import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { EditorStore, newPlan } from "@hushmark/editor-core";
import { LevelBar, levelBelow } from "./level-bar";

describe("level bar", () => {
  it("adds a level above the top one and switches to it", () => {
    const store = new EditorStore(newPlan("p", "Plan"));
    const onLevel = vi.fn();
    render(<LevelBar plan={store.plan} levelId="ground" onLevel={onLevel} store={store} readOnly={false} />);
    fireEvent.click(screen.getByRole("button", { name: "Add level" }));
    const added = Object.values(store.plan.elements).find((e) => e.type === "level" && e.id !== "ground");
    expect(added).toMatchObject({ name: "Level 2" });
    expect(added?.type === "level" && added.elevationM).toBeGreaterThan(2.5);
    expect(onLevel).toHaveBeenCalledWith(added!.id);
    expect(levelBelow(store.plan, added!.id)).toBe("ground");
    expect(levelBelow(store.plan, "ground")).toBeNull();
  });

  it("renames the level in place; Escape leaves it as it was", () => {
    const store = new EditorStore(newPlan("p", "Plan"));
    const { rerender } = render(<LevelBar plan={store.plan} levelId="ground" onLevel={() => {}} store={store} readOnly={false} />);
    fireEvent.click(screen.getByRole("button", { name: "Rename" }));
    const input = screen.getByLabelText("Name of this level");
    fireEvent.change(input, { target: { value: "Basement" } });
    fireEvent.keyDown(input, { key: "Escape" });
    expect(store.plan.elements.ground).toMatchObject({ name: "Ground floor" });
    fireEvent.click(screen.getByRole("button", { name: "Rename" }));
    fireEvent.change(screen.getByLabelText("Name of this level"), { target: { value: "Shop floor" } });
    fireEvent.keyDown(screen.getByLabelText("Name of this level"), { key: "Enter" });
    expect(store.plan.elements.ground).toMatchObject({ name: "Shop floor" });
    rerender(<LevelBar plan={store.plan} levelId="ground" onLevel={() => {}} store={store} readOnly />);
    expect(screen.queryByRole("button", { name: "Rename" })).toBeNull();
    expect(screen.getByRole("option", { name: "Shop floor" })).toBeTruthy();
  });
});
