import { describe, expect, it } from "vitest";
import { CollisionGrid, fitName } from "./label-layout";

const mono = (t: string) => t.length * 7;

describe("CollisionGrid", () => {
  it("keeps the first of two overlapping labels and refuses the second", () => {
    const g = new CollisionGrid();
    expect(g.place({ x: 0, y: 0, w: 80, h: 16 })).toBe(true);
    expect(g.place({ x: 60, y: 8, w: 80, h: 16 })).toBe(false);
  });

  it("places labels that only come close, across cell borders and at negative positions", () => {
    const g = new CollisionGrid();
    expect(g.place({ x: -70, y: -20, w: 60, h: 16 })).toBe(true);
    expect(g.place({ x: 0, y: -20, w: 60, h: 16 })).toBe(true);
    expect(g.place({ x: 60, y: 60, w: 10, h: 10 })).toBe(true);
    // Wider than several cells, and overlapping only the one at negative x.
    expect(g.place({ x: -200, y: -10, w: 135, h: 4 })).toBe(false);
  });

  it("does not file a refused label, so a later one may take the same place", () => {
    const g = new CollisionGrid();
    g.place({ x: 0, y: 0, w: 50, h: 10 });
    expect(g.place({ x: 40, y: 0, w: 50, h: 10 })).toBe(false);
    expect(g.place({ x: 100, y: 0, w: 40, h: 10 })).toBe(true);
  });
});

describe("fitName", () => {
  it("keeps a name that fits and shortens one that does not", () => {
    expect(fitName("Bedroom", 100, mono)).toBe("Bedroom");
    const short = fitName("Living room and kitchen", 140, mono);
    expect(short?.endsWith("…")).toBe(true);
    expect(mono(short!)).toBeLessThanOrEqual(132);
  });

  it("gives up rather than keep less than most of the name", () => {
    expect(fitName("Bathroom", 30, mono)).toBeNull();
    // "Room 0.7.2" shortened to fit 40 px would be "Room…"-ish: hidden instead.
    expect(fitName("Room 0.7.2", 48, mono)).toBeNull();
    expect(fitName("Room 0.7.2", 63, mono)).toBe("Room 0…");
  });
});
