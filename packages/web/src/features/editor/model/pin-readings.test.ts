import { describe, expect, it } from "vitest";
import { EditorStore, addPin, addRoomRectangle, newPlan } from "@hushmark/editor-core";
import type { Measurement } from "@hushmark/schemas";
import { peakBand, pinReadings, readingText } from "./pin-readings";

const flat = (db: number) => Array.from({ length: 21 }, () => db);

function measurement(over: Partial<Measurement>): Measurement {
  return {
    id: "00000000-0000-4000-8000-000000000001", projectId: "00000000-0000-4000-8000-0000000000aa", label: "Evening", kind: "receiver_side", source: "csv", status: "ready", progress: 1, error: null,
    takenAt: "2026-05-01T21:00:00.000Z", roomId: "bed", point: { x: 2, y: 1.5 }, device: "", calibrationDb: 0, leqDb: flat(30), lmaxDb: null, l10Db: null, l90Db: null,
    summary: null, events: null, hasRecording: false, createdAt: "2026-05-01T21:00:00.000Z", ...over,
  };
}

function planWithPins() {
  const store = new EditorStore(newPlan("p", "Plan"));
  store.run(addRoomRectangle({ id: "bed", levelId: "ground", name: "Bedroom" }, { x: 0, y: 0 }, { x: 4, y: 3 }));
  store.run(addRoomRectangle({ id: "hall", levelId: "ground", name: "Hall" }, { x: 4, y: 0 }, { x: 8, y: 3 }));
  store.run(addPin("pin-1", "ground", { x: 1, y: 1 }, "By the bed"));
  store.run(addPin("pin-2", "ground", { x: 3.5, y: 2.5 }, "By the door"));
  store.run(addPin("pin-3", "ground", { x: 6, y: 1 }, "Hall"));
  return store.plan;
}

describe("pin readings", () => {
  it("gives a room's measurement to the nearest pin standing in that room, and keeps the latest", () => {
    const plan = planWithPins();
    const leq = flat(30);
    leq[4] = 52; // 125 Hz
    const older = measurement({ id: "00000000-0000-4000-8000-000000000002", takenAt: "2026-04-01T21:00:00.000Z", point: { x: 3, y: 2.4 }, leqDb: flat(60) });
    const newer = measurement({ id: "00000000-0000-4000-8000-000000000003", takenAt: "2026-05-02T21:00:00.000Z", point: { x: 3, y: 2.4 }, leqDb: leq });
    const readings = pinReadings(plan, [newer, older]);
    expect(readings.has("pin-1")).toBe(false);
    expect(readings.has("pin-3")).toBe(false);
    const r = readings.get("pin-2")!;
    expect(r.measurementId).toBe(newer.id);
    expect(r.peakBandHz).toBe(125);
    expect(r.peakDb).toBe(52);
    expect(readingText(r)).toMatch(/^\d+ dBA · peak 125 Hz$/);
  });

  it("prefers the recorded LAeq, skips unfinished measurements and matches a roomless one by distance", () => {
    const plan = planWithPins();
    const readings = pinReadings(plan, [
      measurement({ roomId: null, point: { x: 6.5, y: 1.2 }, summary: { laeqDb: 41.26, lafmaxDb: null, la10Db: null, la90Db: null, durationS: null, sampleRateHz: null, channels: null } }),
      measurement({ id: "00000000-0000-4000-8000-000000000009", status: "processing", point: { x: 1, y: 1 } }),
      measurement({ id: "00000000-0000-4000-8000-000000000010", roomId: null, point: { x: 20, y: 20 } }),
    ]);
    expect([...readings.keys()]).toEqual(["pin-3"]);
    expect(readings.get("pin-3")!.laeqDb).toBe(41.26);
    expect(readingText(readings.get("pin-3")!)).toBe("41 dBA · peak 50 Hz");
  });

  it("finds no peak in a spectrum without levels", () => {
    expect(peakBand(Array.from({ length: 21 }, () => null))).toBeNull();
  });
});
