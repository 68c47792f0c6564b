import { describe, expect, it } from "vitest";
import { affineMirrors, affinePoint, affineThen, insertMaps } from "./dxf-blocks.js";

const close = (p: { x: number; y: number }, x: number, y: number) => {
  expect(p.x).toBeCloseTo(x, 12);
  expect(p.y).toBeCloseTo(y, 12);
};

describe("block placement", () => {
  it("moves the base point to the insertion point, then scales and turns about it", () => {
    const [m] = insertMaps({ position: { x: 10, y: 20 }, xScale: 2, yScale: 3, rotation: 90 }, { x: 1, y: 0 });
    close(affinePoint(m!, { x: 1, y: 0 }), 10, 20);
    // (2, 0) is 1 unit from the base along x: scaled to 2, turned to +y.
    close(affinePoint(m!, { x: 2, y: 0 }), 10, 22);
    // (1, 1) is 1 unit along y: scaled to 3, turned to −x.
    close(affinePoint(m!, { x: 1, y: 1 }), 7, 20);
  });

  it("lays out a MINSERT array in the block's turned frame", () => {
    const maps = insertMaps({ position: { x: 0, y: 0 }, rotation: 90, columnCount: 2, rowCount: 2, columnSpacing: 5, rowSpacing: 4 }, undefined);
    expect(maps).toHaveLength(4);
    const corners = maps.map((m) => affinePoint(m, { x: 0, y: 0 }));
    close(corners[0]!, 0, 0);
    close(corners[1]!, 0, 5);
    close(corners[2]!, -4, 0);
    close(corners[3]!, -4, 5);
  });

  it("mirrors under a downward extrusion and a negative scale, and composes nested blocks", () => {
    const [flipped] = insertMaps({ position: { x: 3, y: 0 }, extrusionDirection: { z: -1 } }, undefined);
    close(affinePoint(flipped!, { x: 1, y: 1 }), -4, 1);
    expect(affineMirrors(flipped!)).toBe(true);
    const [negative] = insertMaps({ xScale: -1 }, undefined);
    expect(affineMirrors(negative!)).toBe(true);
    const [outer] = insertMaps({ position: { x: 100, y: 0 }, rotation: 180 }, undefined);
    const [inner] = insertMaps({ position: { x: 1, y: 2 } }, undefined);
    close(affinePoint(affineThen(outer!, inner!), { x: 0, y: 0 }), 99, -2);
  });
});
