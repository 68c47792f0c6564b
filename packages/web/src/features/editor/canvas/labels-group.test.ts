import { describe, expect, it } from "vitest";
import { fernhollowStudioPlan } from "@hushmark/floorplan";
import { paintLabels } from "./labels-group";

/** A 2D context that measures every letter 7 px wide and records the text it is asked to draw. */
function recordingContext(): { ctx: CanvasRenderingContext2D; texts: string[]; at: Map<string, { x: number; y: number }> } {
  const texts: string[] = [];
  const at = new Map<string, { x: number; y: number }>();
  const target: Record<string, unknown> = {
    measureText: (t: string) => ({ width: t.length * 7 }),
    fillText: (t: string, x: number, y: number) => {
      texts.push(t);
      at.set(t, { x, y });
    },
  };
  const ctx = new Proxy(target, { get: (o, key: string) => (key in o ? o[key] : () => undefined) });
  return { ctx: ctx as unknown as CanvasRenderingContext2D, texts, at };
}

// About the zoom the proposal plan fits the studio at on a phone: the back room is 144 × 54 px and
// the label of pin M1 runs across its middle.
const phone = { levelId: "ground", scale: 18, unit: "metric" as const, ox: 0, oy: 0 };

describe("label order on the plan", () => {
  it("in the editor, the pin's label keeps its place and the room name under it gives way", () => {
    const { ctx, texts } = recordingContext();
    paintLabels(ctx, { plan: fernhollowStudioPlan(), ...phone });
    expect(texts).toContain("M1 — recording room, mic position");
    expect(texts.some((t) => t.startsWith("Café back room"))).toBe(false);
  });

  it("on a read-only view every room big enough on screen is named, and pins' labels move aside or yield", () => {
    const { ctx, texts, at } = recordingContext();
    paintLabels(ctx, { plan: fernhollowStudioPlan(), ...phone, roomNamesFirst: true });
    for (const name of ["Café back room", "Café (counter", "Recording room", "Control room"]) expect(texts.some((t) => t.startsWith(name))).toBe(true);
    // M1's label still finds room beside its ring. M2's would cover the café's name beside its
    // ring, so it goes above or below the ring instead, clear of the name's row.
    expect(texts).toContain("M1 — recording room, mic position");
    expect(texts).toContain("M2 — café, by the grinder");
    const pin = fernhollowStudioPlan().elements["pin-grinder"];
    const label = at.get("M2 — café, by the grinder")!;
    const name = at.get([...at.keys()].find((t) => t.startsWith("Café (counter"))!)!;
    expect(pin?.type).toBe("pin");
    if (pin?.type === "pin") expect(Math.abs(label.y - -pin.position.y * phone.scale)).toBeGreaterThan(9);
    expect(Math.abs(label.y - name.y)).toBeGreaterThan(12);
  });

  it("keeps text off the points another layer draws markers on", () => {
    const { ctx, texts } = recordingContext();
    // A marker on the middle of the control room (3, 2) and another 20 px above and below it leave no row for its name.
    const keepClear = [{ x: 3, y: 2 }, { x: 3, y: 2 + 20 / 18 }, { x: 3, y: 2 - 20 / 18 }, { x: 1, y: 2 }, { x: 5, y: 2 }];
    paintLabels(ctx, { plan: fernhollowStudioPlan(), ...phone, roomNamesFirst: true, keepClear });
    expect(texts.some((t) => t.startsWith("Control room"))).toBe(false);
    expect(texts.some((t) => t.startsWith("Recording room"))).toBe(true);
  });
});
