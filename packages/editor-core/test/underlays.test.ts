import { describe, expect, it } from "vitest";
import { planWallPieces, polygonAreaM2, type Room } from "@hushmark/floorplan";
import { addUnderlay, removeUnderlay, setUnderlayLook, setUnderlayPlacement } from "../src/commands/underlays.js";
import { calibrateUnderlayTyped, rotateUnderlayAbout, squaringTurnDeg, underlayPixelToPlan } from "../src/underlays/placement.js";
import { ToolHarness } from "./harness.js";

/**
 * A scanned plan 2000 × 1500 px whose room outline runs from pixel (200, 300) to (1800, 1260):
 * 1600 × 960 px. Dropped on the plan at a guessed scale and a few degrees askew, as a photo is.
 */
const IMAGE = { widthPx: 2000, heightPx: 1500 };
const ROOM_PX = { left: 200, top: 300, right: 1800, bottom: 1260 };

function placedAskew(h: ToolHarness) {
  h.store.run(addUnderlay({ id: "scan", fileId: "file-1", levelId: "ground", ...IMAGE, origin: { x: -3, y: 12 }, scaleMPerPx: 0.013, rotationDeg: 4 }));
  return () => h.plan.underlays!.find((u) => u.id === "scan")!;
}

/** Calibrates on the outline's bottom edge, squares it on that edge, moves its corner to the plan origin, as a surveyor does on screen. */
function calibrateSquareAndMove(h: ToolHarness, typed: string, unit: "metric" | "imperial") {
  const u = placedAskew(h);
  const a = underlayPixelToPlan(u(), ROOM_PX.left, ROOM_PX.bottom), b = underlayPixelToPlan(u(), ROOM_PX.right, ROOM_PX.bottom);
  const calibrated = calibrateUnderlayTyped(u(), a, b, typed, unit);
  if (!calibrated.ok) throw new Error(calibrated.message);
  h.store.run(setUnderlayPlacement("scan", calibrated.placement, "calibrate underlay", { calibrated: true }));
  const a1 = underlayPixelToPlan(u(), ROOM_PX.left, ROOM_PX.bottom), b1 = underlayPixelToPlan(u(), ROOM_PX.right, ROOM_PX.bottom);
  h.store.run(setUnderlayPlacement("scan", rotateUnderlayAbout(u(), a1, squaringTurnDeg(a1, b1)), "square underlay"));
  const corner = underlayPixelToPlan(u(), ROOM_PX.left, ROOM_PX.bottom);
  h.store.run(setUnderlayPlacement("scan", { origin: { x: u().origin.x - corner.x, y: u().origin.y - corner.y } }));
  return u;
}

/** Drags the rectangle tool between the outline's corners as they now lie on the plan. */
function traceRoom(h: ToolHarness, u: () => Parameters<typeof underlayPixelToPlan>[0]) {
  const p = underlayPixelToPlan(u(), ROOM_PX.left, ROOM_PX.bottom), q = underlayPixelToPlan(u(), ROOM_PX.right, ROOM_PX.top);
  h.use("room-rectangle").drag([[p.x, p.y], [q.x, q.y]]);
  const room = h.elementsOf("room")[0] as Room;
  const lengths = planWallPieces(h.plan).filter((w) => w.sides.some((s) => s.roomId === room.id)).map((w) => Number(w.lengthM.toFixed(3))).sort((x, y) => x - y);
  return { room, lengths };
}

describe("a calibrated underlay gives the right lengths for traced walls", () => {
  it("metric: 1600 px typed as 8 m makes the traced room 8 × 4.8 m", () => {
    const h = new ToolHarness(undefined, "select", { gridM: 0.05 });
    const u = calibrateSquareAndMove(h, "8", "metric");
    expect(u().scaleMPerPx).toBeCloseTo(8 / 1600, 12);
    expect(u().rotationDeg).toBeCloseTo(0, 6);
    expect(u().calibrated).toBe(true);
    const { room, lengths } = traceRoom(h, u);
    expect(lengths).toEqual([4.8, 4.8, 8, 8]); // 960 px × 5 mm/px = 4.8 m
    expect(polygonAreaM2(room.outline)).toBeCloseTo(38.4, 6);
  });

  it(`imperial: 1600 px typed as 26' 3" gives 26' 3" × 15' 9" walls`, () => {
    const h = new ToolHarness(undefined, "select", { gridM: 0.001, unit: "imperial" });
    const u = calibrateSquareAndMove(h, `26' 3"`, "imperial");
    const { lengths } = traceRoom(h, u);
    const long = 26.25 * 0.3048, short = long * (960 / 1600); // 1 ft = 0.3048 m exactly
    expect(lengths).toEqual([short, short, long, long].map((m) => Number(m.toFixed(3))));
  });

  it("an uncalibrated, askew underlay would not: the same trace is off", () => {
    const h = new ToolHarness(undefined, "select", { gridM: 0.05 });
    const u = placedAskew(h);
    const { lengths } = traceRoom(h, u);
    expect(lengths).not.toEqual([4.8, 4.8, 8, 8]);
  });
});

describe("underlay commands", () => {
  it("are undone one step at a time", () => {
    const h = new ToolHarness();
    const u = placedAskew(h);
    h.store.run(setUnderlayLook("scan", { opacity: 0.8 }));
    h.store.run(setUnderlayPlacement("scan", { rotationDeg: 10 }));
    expect(u().rotationDeg).toBe(10);
    h.store.undo();
    expect(u().rotationDeg).toBe(4);
    expect(u().opacity).toBe(0.8);
    h.store.undo();
    expect(u().opacity).toBe(0.5);
  });

  it("leave a locked underlay where it is until it is unlocked", () => {
    const h = new ToolHarness();
    const u = placedAskew(h);
    h.store.run(setUnderlayLook("scan", { locked: true }));
    expect(h.store.run(setUnderlayPlacement("scan", { origin: { x: 0, y: 0 } }))).toBeNull();
    expect(u().origin).toEqual({ x: -3, y: 12 });
    h.store.run(setUnderlayLook("scan", { locked: false }));
    h.store.run(setUnderlayPlacement("scan", { origin: { x: 0, y: 0 } }));
    expect(u().origin).toEqual({ x: 0, y: 0 });
  });

  it("hide, show and remove; removing the last leaves no list behind", () => {
    const h = new ToolHarness();
    const u = placedAskew(h);
    h.store.run(setUnderlayLook("scan", { visible: false }));
    expect(u().visible).toBe(false);
    h.store.run(removeUnderlay("scan"));
    expect("underlays" in h.plan).toBe(false);
    h.store.undo();
    expect(u().visible).toBe(false);
  });
});
