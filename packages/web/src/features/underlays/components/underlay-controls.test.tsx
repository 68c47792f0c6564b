import { act, fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { EditorStore, addUnderlay, newPlan, underlayPixelToPlan } from "@hushmark/editor-core";
import { toScreen, type Viewport } from "../../editor/model/viewport";
import { UnderlayUi } from "../model/underlay-ui";
import { UnderlayPicker } from "./underlay-picker";
import { UnderlayRow } from "./underlay-row";

function storeWithUnderlay() {
  const store = new EditorStore(newPlan("p", "Plan"));
  store.run(addUnderlay({ id: "scan", fileId: "f1", levelId: "ground", name: "Agent's plan", widthPx: 1000, heightPx: 700, origin: { x: 0, y: 7 }, scaleMPerPx: 0.01 }));
  return store;
}
const underlay = (store: EditorStore) => store.plan.underlays![0]!;

describe("underlay row", () => {
  it("changes the strength as one undo step when the slider is let go, not per step", () => {
    const store = storeWithUnderlay();
    const ui = new UnderlayUi();
    render(<UnderlayRow underlay={underlay(store)} store={store} ui={ui} unit="metric" onPick={() => {}} />);
    const before = store.historySize.past;
    const slider = screen.getByLabelText("Strength of the drawing");
    fireEvent.change(slider, { target: { value: "70" } });
    fireEvent.change(slider, { target: { value: "80" } });
    expect(store.historySize.past).toBe(before);
    fireEvent.pointerUp(slider);
    expect(underlay(store).opacity).toBe(0.8);
    expect(store.historySize.past).toBe(before + 1);
  });

  it("offers no scaling, squaring or moving while locked", () => {
    const store = storeWithUnderlay();
    const ui = new UnderlayUi();
    const { rerender } = render(<UnderlayRow underlay={underlay(store)} store={store} ui={ui} unit="metric" onPick={() => {}} />);
    fireEvent.click(screen.getByLabelText("Lock"));
    rerender(<UnderlayRow underlay={underlay(store)} store={store} ui={ui} unit="metric" onPick={() => {}} />);
    for (const name of ["Set scale…", "Square to a line", "Move"]) expect((screen.getByRole("button", { name }) as HTMLButtonElement).disabled).toBe(true);
    expect(screen.getByText("Scale not set yet")).toBeTruthy();
  });
});

describe("underlay picker", () => {
  it("takes two clicks over the canvas before any tool sees them, then the typed distance sets the scale", () => {
    const store = storeWithUnderlay();
    const ui = new UnderlayUi();
    const view: Viewport = { scale: 50, ox: 100, oy: 500 };
    let toolSaw = 0;
    const Host = () => (
      <div data-testid="host" onPointerDown={() => toolSaw++}>
        <UnderlayPicker ui={ui} plan={store.plan} store={store} viewport={view} />
      </div>
    );
    const { rerender } = render(<Host />);
    act(() => ui.start("calibrate", "scan"));
    rerender(<Host />);
    const host = screen.getByTestId("host");
    for (const [u, v] of [[100, 600], [900, 600]] as const) {
      const p = underlayPixelToPlan(underlay(store), u, v);
      const s = toScreen(view, p.x, p.y);
      act(() => { host.dispatchEvent(new PointerEvent("pointerdown", { bubbles: true, button: 0, clientX: s.x, clientY: s.y })); });
    }
    expect(toolSaw).toBe(0);
    expect(ui.pick?.points).toHaveLength(2);
    fireEvent.change(screen.getByLabelText("Real distance between the two points"), { target: { value: "4 m" } });
    fireEvent.click(screen.getByRole("button", { name: "Set scale" }));
    expect(underlay(store).scaleMPerPx).toBeCloseTo(4 / 800, 6);
    expect(underlay(store).calibrated).toBe(true);
    expect(ui.pick).toBeNull();
    expect(store.undoLabel).toBe("set underlay scale");
  });
});

