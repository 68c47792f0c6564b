import { describe, expect, it } from "vitest";
import { buildNetwork } from "../builder/build-network.js";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { cinemaUnderNurseryPlan } from "../demo/cinema-under-nursery.js";
import { fernhollowStudioPlan } from "../demo/fernhollow-studio.js";
import { elementsOfType } from "../document/elements.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { planWallPieces } from "../geometry/walls.js";
import { csvField } from "./csv-text.js";
import { elementSchedule } from "./element-schedule.js";
import { elementScheduleCsv, SCHEDULE_COLUMNS } from "./schedule-csv.js";

/** RFC 4180 reader for the test: quoted fields, doubled quotes, CRLF rows. */
function csvRows(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [], field = "", quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') { field += '"'; i++; } else if (c === '"') quoted = false; else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ",") { row.push(field); field = ""; }
    else if (c === "\r" && text[i + 1] === "\n") { row.push(field); rows.push(row); row = []; field = ""; i++; }
    else field += c;
  }
  return rows;
}

describe("element schedule", () => {
  for (const make of [fernhollowStudioPlan, cinemaUnderNurseryPlan]) {
    it(`${make().id}: wall and opening areas match the network the plan builds`, () => {
      const plan = make();
      const rows = elementSchedule(plan, constructionCatalogue);
      const built = buildNetwork(plan, constructionCatalogue, { flanking: false });
      if (!built.ok) throw new Error("demo plan does not build");
      let compared = 0;
      for (const link of built.network.links ?? []) {
        if (link.type !== "partition" || !link.id.startsWith("wall:")) continue;
        const pieceId = link.id.slice("wall:".length);
        const row = rows.find((r) => r.kind === "wall" && r.id === pieceId);
        expect(row, pieceId).toBeDefined();
        const parts = (link as { parts: Array<{ id: string; area_m2: number; ref: string }> }).parts;
        const wallPart = parts.find((p) => p.id === `${pieceId}:wall`);
        expect(row!.netAreaM2!).toBeCloseTo(wallPart?.area_m2 ?? 0, 9);
        // The builder's parts add up to the wall's gross area.
        expect(row!.grossAreaM2!).toBeCloseTo(parts.reduce((s, p) => s + p.area_m2, 0), 9);
        for (const p of parts.filter((q) => q.ref !== pieceId)) {
          const opening = rows.find((r) => r.id === p.ref)!;
          const sum = parts.filter((q) => q.ref === p.ref).reduce((s, q) => s + q.area_m2, 0);
          expect(opening.kind === "penetration" ? opening.openAreaM2! : opening.grossAreaM2!, p.ref).toBeCloseTo(sum, 9);
        }
        compared++;
      }
      expect(compared).toBeGreaterThan(3);
      expect(rows.filter((r) => r.kind === "wall")).toHaveLength(planWallPieces(plan).length);
      for (const room of elementsOfType(plan, "room")) {
        expect(rows.find((r) => r.id === `${room.id}.floor`)!.netAreaM2).toBeCloseTo(polygonAreaM2(room.outline), 12);
      }
    });
  }

  it("gives the shopfront wall's quantities as worked by hand", () => {
    const rows = elementSchedule(fernhollowStudioPlan(), constructionCatalogue);
    // 6 m × 2.7 m = 16.2 m² less the 4.2 × 2.2 m glazing and the 0.9 × 2.1 m street door = 5.07 m².
    const wall = rows.find((r) => r.id === "control:control1|0")!;
    expect(wall.lengthM).toBeCloseTo(6, 9);
    expect(wall.grossAreaM2).toBeCloseTo(16.2, 9);
    expect(wall.netAreaM2).toBeCloseTo(5.07, 9);
    expect(wall.between).toBe("Control room / outdoors");
    expect(rows.find((r) => r.id === "control.floor")!.netAreaM2).toBeCloseTo(24, 9);
    const door = rows.find((r) => r.id === "door-street")!;
    expect(door.leak).toBe("undercut 8 mm; perimeter gap 3 mm");
    // 0.9 m × 8 mm under the leaf + (2 × 2.1 + 0.9) m × 3 mm round it.
    expect(door.openAreaM2).toBeCloseTo(0.0072 + 0.0153, 9);
    expect(door.stc).toBe(20);
    const shopfront = rows.find((r) => r.id === "shopfront")!;
    expect(shopfront.leak).toBe("seals cracked");
  });

  it("writes CSV a spreadsheet reads back, with a header, one line per row and quoted names", () => {
    const plan = fernhollowStudioPlan();
    const text = elementScheduleCsv(plan, constructionCatalogue);
    const parsed = csvRows(text);
    expect(parsed[0]).toEqual(SCHEDULE_COLUMNS.map(([h]) => h));
    const rows = elementSchedule(plan, constructionCatalogue);
    expect(parsed).toHaveLength(rows.length + 1);
    const col = (h: string) => parsed[0]!.indexOf(h);
    const shop = parsed.find((r) => r[col("id")] === "control:control1|0")!;
    expect(shop[col("net_area_m2")]).toBe("5.070");
    expect(parsed.every((r) => r.length === parsed[0]!.length)).toBe(true);
    expect(text).toContain(',"Supply grille, recording room",');
    expect(parsed.some((r) => r[col("name")] === "Supply grille, recording room")).toBe(true);
    expect(csvField('a "b", c')).toBe('"a ""b"", c"');
    expect(csvField("=SUM(A1)")).toBe("'=SUM(A1)");
    expect(text.endsWith("\r\n")).toBe(true);
  });
});
