import type { Leaks, Plan, Point } from "@hushmark/floorplan";
import { command, type Command } from "../store/command.js";
import { wallHosts, type WallHost } from "../geometry/hosts.js";
import { closestOnSegment } from "../geometry/vec.js";

export type OpeningKind = "door" | "window" | "penetration";

/** Usual sizes for a new opening, m. */
export const OPENING_DEFAULTS: Record<OpeningKind, { widthM: number; heightM: number; constructionId?: string }> = {
  door: { widthM: 0.85, heightM: 2.04, constructionId: "door-hollow-core" },
  window: { widthM: 1.2, heightM: 1.2, constructionId: "glazing-double-4-16-4" },
  penetration: { widthM: 0.08, heightM: 0.3 },
};

/** Where an opening of `widthM` centred near `p` would sit: the nearest wall line within `toleranceM`, offset clamped to fit. */
export function openingSpot(plan: Plan, levelId: string, p: Point, widthM: number, toleranceM: number): { host: WallHost; offsetM: number } | null {
  let best: { host: WallHost; t: number; d: number } | null = null;
  for (const h of wallHosts(plan)) {
    if (h.levelId !== levelId || h.lengthM < widthM) continue;
    const c = closestOnSegment(p, h.start, h.end);
    if (c.distance <= h.thicknessM / 2 + toleranceM && (!best || c.distance < best.d)) best = { host: h, t: c.t, d: c.distance };
  }
  if (!best) return null;
  const centre = best.t * best.host.lengthM;
  const offsetM = Math.round(Math.max(0, Math.min(best.host.lengthM - widthM, centre - widthM / 2)) * 1000) / 1000;
  return { host: best.host, offsetM };
}

const NO_LEAKS: Leaks = { undercutMm: 0, perimeterGapMm: 0, sealsCracked: false };

/** Adds a door, window or gap on a wall line at `offsetM` from the line's start (m). */
export function addOpening(kind: OpeningKind, id: string, wallRef: string, offsetM: number, size: { widthM?: number; heightM?: number } = {}): Command {
  const d = OPENING_DEFAULTS[kind];
  const widthM = size.widthM ?? d.widthM;
  const heightM = size.heightM ?? d.heightM;
  const label = kind === "penetration" ? "add gap" : `add ${kind}`;
  return command(`${kind}.add`, label, (draft) => {
    if (draft.elements[id]) return;
    const base = { id, wallRef, offsetM, widthM, heightM };
    if (kind === "door") draft.elements[id] = { type: "door", ...base, constructionId: d.constructionId!, leaks: { ...NO_LEAKS } };
    else if (kind === "window") draft.elements[id] = { type: "window", ...base, sillM: 0.9, constructionId: d.constructionId!, leaks: { ...NO_LEAKS } };
    else draft.elements[id] = { type: "penetration", ...base, what: "cable-hole", openAreaM2: 0.0005 };
  });
}

/** Slides an opening along its wall line or onto another one (m). */
export function placeOpening(id: string, wallRef: string, offsetM: number): Command {
  return command("opening.move", "move opening", (draft) => {
    const el = draft.elements[id];
    if (!el || (el.type !== "door" && el.type !== "window" && el.type !== "penetration")) return;
    el.wallRef = wallRef;
    el.offsetM = Math.round(offsetM * 1000) / 1000;
  });
}

/** Changes a door's or window's leaks (undercut and gap in mm, cracked seals). */
export function setLeaks(id: string, leaks: Partial<Leaks>): Command {
  return command("opening.leaks", "change leaks", (draft) => {
    const el = draft.elements[id];
    if (!el || (el.type !== "door" && el.type !== "window")) return;
    el.leaks = { ...NO_LEAKS, ...el.leaks, ...leaks };
  });
}
