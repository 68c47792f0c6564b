import { finishPresets } from "../catalogue/finishes.js";
import type { Plan, PlanInput, RoomUse } from "../document/schema.js";
import { planDocument, rectangle } from "../demo/helpers.js";
import { seededRandom } from "./random.js";

type ElementInput = PlanInput["elements"][string];

export interface SyntheticOptions {
  rooms: number;
  levels: number;
  seed: number;
  /** Add a ceiling void over each row of the ground level (default true). */
  voids?: boolean;
  /** Share of ground-floor rooms with a lay-in tile ceiling into the void, the rest plasterboard (default 0.3). */
  tileCeilingShare?: number;
}

const USES: RoomUse[] = ["office", "bedroom", "living", "meeting", "studio", "kitchen", "corridor", "storage"];
const WALLS = ["stud-wood-1x1-gypsum", "stud-wood-1x1-gypsum-insulated", "stud-steel-1x1-gypsum-insulated", "masonry-block-200"];
const DOORS = ["door-hollow-core", "door-solid-core", "door-solid-core-sealed"];

/**
 * A synthetic multi-storey building for benchmarks: each level a grid of rectangular rooms whose
 * columns and rows line up between levels, doors in most shared walls, windows on the façades,
 * ducts between some rooms and a ceiling void per ground-floor row, under which about a third
 * of the rooms have lay-in tile ceilings and the rest plasterboard. Same seed, same plan.
 */
export function generateSyntheticBuilding(options: SyntheticOptions): Plan {
  const rand = seededRandom(options.seed);
  const pick = <T>(list: readonly T[]): T => list[Math.floor(rand() * list.length)]!;
  const levels = Math.max(1, Math.floor(options.levels));
  const perLevel = Math.ceil(options.rooms / levels);
  const cols = Math.ceil(Math.sqrt(perLevel));
  const rows = Math.ceil(perLevel / cols);
  const colX = [0];
  for (let c = 0; c < cols; c++) colX.push(colX[c]! + 3 + Math.round(rand() * 30) / 10);
  const rowY = [0];
  for (let r = 0; r < rows; r++) rowY.push(rowY[r]! + 3 + Math.round(rand() * 30) / 10);
  const elements: ElementInput[] = [];
  const wallSettings: Record<string, { constructionId: string }> = {};
  let made = 0;
  for (let k = 0; k < levels; k++) {
    const levelId = `L${k}`;
    elements.push({ type: "level", id: levelId, name: `Level ${k}`, elevationM: k * 3, heightM: 2.6 });
    const ids: Array<Array<string | undefined>> = [];
    for (let r = 0; r < rows; r++) {
      ids.push([]);
      for (let c = 0; c < cols; c++) {
        if (r * cols + c >= perLevel || made >= options.rooms) { ids[r]!.push(undefined); continue; }
        const id = `r${k}-${r}-${c}`;
        ids[r]!.push(id);
        made++;
        const preset = pick(finishPresets).id;
        const tile = rand() < (options.tileCeilingShare ?? 0.3);
        elements.push({
          type: "room", id, levelId, name: `Room ${k}.${r}.${c}`, use: pick(USES),
          outline: rectangle(id, colX[c]!, rowY[r]!, colX[c + 1]! - colX[c]!, rowY[r + 1]! - rowY[r]!),
          finish: { kind: "preset", presetId: preset },
          ...(k === 0 ? { ceiling: { constructionId: tile ? "ceiling-suspended-tile" : "ceiling-gypsum-12-5" } } : {}),
        });
      }
    }
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < cols; c++) {
        const id = ids[r]![c];
        if (!id) continue;
        const w = colX[c + 1]! - colX[c]!, d = rowY[r + 1]! - rowY[r]!;
        const east = ids[r]![c + 1];
        // Corner 2 starts the east edge; corner 1 the south edge; corner 3 the north edge.
        if (east) {
          const widthM = 0.8 + Math.round(rand() * 2) / 10;
          if (rand() < 0.8) {
            elements.push({ type: "door", id: `${id}-door`, wallRef: `${id}:${id}2`, offsetM: Math.round(rand() * (d - widthM - 0.2) * 10) / 10 + 0.1, widthM, heightM: 2.0, constructionId: pick(DOORS), leaks: { undercutMm: Math.round(rand() * 15), perimeterGapMm: Math.round(rand() * 3), sealsCracked: rand() < 0.2 } });
          }
          const refs = [`${id}:${id}2`, `${east}:${east}4`].sort();
          wallSettings[refs.join("|")] = { constructionId: pick(WALLS) };
          if (rand() < 0.3) elements.push({ type: "penetration", id: `${id}-box`, wallRef: `${id}:${id}2`, offsetM: d - 0.1, widthM: 0.05, what: "outlet-box", openAreaM2: 0.0004 });
        }
        if (r === 0) elements.push({ type: "window", id: `${id}-win`, wallRef: `${id}:${id}1`, offsetM: 0.5, widthM: Math.min(1.5, w - 1), heightM: 1.2, sillM: 0.9, constructionId: "glazing-double-4-16-4" });
        if (rand() < 0.1 && east) {
          elements.push({ type: "vent", id: `${id}-g1`, spaceId: id, mount: "ceiling", position: { x: colX[c]! + w / 2, y: rowY[r]! + d / 2 }, openAreaM2: 0.04 });
          elements.push({ type: "vent", id: `${id}-g2`, spaceId: east, mount: "ceiling", position: { x: colX[c + 1]! + 1, y: rowY[r]! + d / 2 }, openAreaM2: 0.04 });
          elements.push({ type: "duct", id: `${id}-duct`, fromVentId: `${id}-g1`, toVentId: `${id}-g2`, lengthM: 3 + Math.round(rand() * 50) / 10, lining: rand() < 0.5 ? "lined" : "bare", bends: Math.floor(rand() * 3) });
        }
      }
    }
    if (k === 0 && options.voids !== false && levels > 1) {
      for (let r = 0; r < rows; r++) {
        const lastCol = ids[r]!.reduce((m, id, c) => (id ? c : m), -1);
        if (lastCol < 2) continue;
        elements.push({ type: "void", id: `void-${r}`, name: `Ceiling void, row ${r}`, kind: "ceiling-void", levelId, outline: rectangle(`void-${r}`, 0, rowY[r]!, colX[lastCol + 1]!, rowY[r + 1]! - rowY[r]!), depthM: 0.4 });
      }
    }
  }
  return planDocument(
    {
      id: `synthetic-${options.rooms}-${levels}-${options.seed}`,
      name: `Synthetic building, ${options.rooms} rooms on ${levels} levels`,
      defaults: {
        interiorWallConstructionId: "stud-wood-1x1-gypsum",
        exteriorWallConstructionId: "masonry-block-200",
        floorConstructionId: "floor-concrete-200",
        ceilingConstructionId: "ceiling-gypsum-12-5",
      },
      wallSettings,
    },
    elements,
  );
}
