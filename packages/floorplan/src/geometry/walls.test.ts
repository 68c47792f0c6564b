import { describe, expect, it } from "vitest";
import { groundLevel, firstLevel, planWith, rect } from "../../test/plan-fixtures.js";
import { planWallPieces, sharedWalls } from "./walls.js";
import { wallJunctions } from "./junctions.js";
import { stackedRooms, roomsCoveredByVoid, roomsAboveVoid } from "./stacking.js";
import { polygonOverlapM2 } from "./overlap.js";

const room = (id: string, x: number, y: number, w: number, h: number, levelId = "L0") => ({
  type: "room" as const, id, levelId, name: id, use: "office" as const, outline: rect(id, x, y, w, h),
});

describe("shared walls", () => {
  it("finds the full shared wall of two 4 × 5 rooms side by side", () => {
    const plan = planWith([groundLevel, room("A", 0, 0, 4, 5), room("B", 4, 0, 4, 5)]);
    const shared = sharedWalls(planWallPieces(plan));
    expect(shared).toHaveLength(1);
    expect(shared[0]!.roomIds).toEqual(["A", "B"]);
    expect(shared[0]!.lengthM).toBeCloseTo(5, 9);
    expect(shared[0]!.id).toBe("A:Ab|B:Bd");
  });

  it("shares half a wall when the neighbour is offset by half its length", () => {
    const plan = planWith([groundLevel, room("A", 0, 0, 4, 4), room("B", 4, 2, 4, 4)]);
    const pieces = planWallPieces(plan);
    const shared = sharedWalls(pieces);
    expect(shared).toHaveLength(1);
    expect(shared[0]!.lengthM).toBeCloseTo(2, 9);
    // A's east edge: 2 m shared, 2 m exterior; B's west edge likewise.
    const aEast = pieces.filter((p) => p.sides.some((s) => s.edgeRef === "A:Ab"));
    expect(aEast.map((p) => [p.kind, +p.lengthM.toFixed(6)]).sort()).toEqual([["exterior", 2], ["shared", 2]]);
  });

  it("splits a long wall at a T-junction between two smaller rooms", () => {
    const plan = planWith([groundLevel, room("A", 0, 0, 8, 3), room("B", 0, 3, 3, 4), room("C", 3, 3, 5, 4)]);
    const pieces = planWallPieces(plan);
    const shared = sharedWalls(pieces).map((s) => [s.roomIds.join("-"), +s.lengthM.toFixed(6)]).sort();
    expect(shared).toEqual([["A-B", 3], ["A-C", 5], ["B-C", 4]]);
    const t = wallJunctions(pieces, 0.05).find((j) => Math.hypot(j.point.x - 3, j.point.y - 3) < 1e-6);
    expect(t?.kind).toBe("t");
    expect(t?.arms).toHaveLength(3);
  });

  it("treats edges within the tolerance as one wall, and a wider gap as two exterior walls", () => {
    const near = planWith([groundLevel, room("A", 0, 0, 4, 5), room("B", 4.03, 0, 4, 5)]);
    expect(sharedWalls(planWallPieces(near))).toHaveLength(1);
    const far = planWith([groundLevel, room("A", 0, 0, 4, 5), room("B", 4.2, 0, 4, 5)]);
    expect(sharedWalls(planWallPieces(far))).toHaveLength(0);
  });

  it("finds a cross junction where four rooms meet", () => {
    const plan = planWith([groundLevel, room("A", 0, 0, 3, 3), room("B", 3, 0, 3, 3), room("C", 0, 3, 3, 3), room("D", 3, 3, 3, 3)]);
    const j = wallJunctions(planWallPieces(plan), 0.05).find((x) => Math.hypot(x.point.x - 3, x.point.y - 3) < 1e-6);
    expect(j?.kind).toBe("cross");
  });

  it("does not pair rooms on different levels", () => {
    const plan = planWith([groundLevel, firstLevel, room("A", 0, 0, 4, 5), room("B", 4, 0, 4, 5, "L1")]);
    expect(sharedWalls(planWallPieces(plan))).toHaveLength(0);
  });
});

describe("stacked rooms and voids", () => {
  it("finds the overlap of a room offset on the next level up", () => {
    const plan = planWith([groundLevel, firstLevel, room("down", 0, 0, 4, 5), room("up", 2, 1, 4, 5, "L1"), room("far", 10, 0, 3, 3, "L1")]);
    const pairs = stackedRooms(plan);
    expect(pairs).toHaveLength(1);
    expect(pairs[0]!.upperRoomId).toBe("up");
    expect(pairs[0]!.overlapM2).toBeCloseTo(2 * 4, 6); // x 2..4, y 1..5
  });

  it("computes an overlap area planar even far from the origin", () => {
    const a = rect("a", 5000, 5000, 4, 5), b = rect("b", 5002, 5000, 4, 5);
    expect(polygonOverlapM2(a, b)).toBeCloseTo(10, 6);
  });

  it("finds the three rooms a ceiling void spans and the room above it", () => {
    const plan = planWith([
      groundLevel, firstLevel,
      room("R1", 0, 0, 3, 4), room("R2", 3, 0, 3, 4), room("R3", 6, 0, 3, 4), room("R4", 9, 0, 3, 4),
      { type: "void", id: "V", name: "Plenum", kind: "ceiling-void", levelId: "L0", outline: rect("V", 0, 0, 9, 4), depthM: 0.5 },
      room("U", 0, 0, 5, 4, "L1"),
    ]);
    const v = plan.elements.V;
    if (v?.type !== "void") throw new Error("fixture");
    const covered = roomsCoveredByVoid(plan, v);
    expect(covered.map((c) => c.roomId)).toEqual(["R1", "R2", "R3"]);
    for (const c of covered) expect(c.fraction).toBeCloseTo(1, 9);
    expect(roomsAboveVoid(plan, v)).toEqual([{ roomId: "U", overlapM2: expect.closeTo(20, 6) }]);
  });
});

import fc from "fast-check";
import { wallPieces } from "./walls.js";

describe("wall pieces of a random grid of rooms (property)", () => {
  it("share every inner grid line once and leave exactly the outer perimeter unshared", () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 20, max: 60 }), { minLength: 1, maxLength: 5 }),
        fc.array(fc.integer({ min: 20, max: 60 }), { minLength: 1, maxLength: 5 }),
        fc.double({ min: -1000, max: 1000, noNaN: true }),
        (ws, hs, shift) => {
          const xs = [shift], ys = [-shift];
          ws.forEach((w) => xs.push(xs.at(-1)! + w / 10));
          hs.forEach((h) => ys.push(ys.at(-1)! + h / 10));
          const rooms = [];
          for (let c = 0; c < ws.length; c++) for (let r = 0; r < hs.length; r++) rooms.push(room(`g${c}x${r}`, xs[c]!, ys[r]!, xs[c + 1]! - xs[c]!, ys[r + 1]! - ys[r]!));
          const pieces = wallPieces(rooms, 0.05);
          const width = xs.at(-1)! - xs[0]!, height = ys.at(-1)! - ys[0]!;
          const shared = pieces.filter((p) => p.kind === "shared").reduce((s, p) => s + p.lengthM, 0);
          const exterior = pieces.filter((p) => p.kind === "exterior").reduce((s, p) => s + p.lengthM, 0);
          expect(shared).toBeCloseTo((ws.length - 1) * height + (hs.length - 1) * width, 6);
          expect(exterior).toBeCloseTo(2 * (width + height), 6);
        },
      ),
      { numRuns: 60 },
    );
  });
});
