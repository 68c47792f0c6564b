import { MEASUREMENT_BANDS_HZ, type Measurement } from "@hushmark/schemas";
import { distanceM, elementsOfType, pointInPolygon, type Pin, type Plan } from "@hushmark/floorplan";
import { aWeightedTotal } from "../../measurements/components/spectrum-math";

/** The latest measurement taken at a pin, as the Sketch shows it. */
export interface PinReading {
  measurementId: string;
  label: string;
  takenAt: string;
  /** A-weighted equivalent level, dBA; null when no band has a level. */
  laeqDb: number | null;
  /** The one-third-octave band with the highest (unweighted) level, Hz. */
  peakBandHz: number | null;
  peakDb: number | null;
}

/** A measurement without a room is matched to a pin this close to its point, m. */
const LOOSE_MATCH_M = 1.5;

function roomOfPin(plan: Plan, pin: Pin): string | null {
  if (pin.spaceId && plan.elements[pin.spaceId]) return pin.spaceId;
  const room = elementsOfType(plan, "room").find((r) => r.levelId === pin.levelId && r.outline.length >= 3 && pointInPolygon(pin.position, r.outline));
  return room?.id ?? null;
}

/** The band at which a spectrum peaks (unweighted), with its level. */
export function peakBand(leqDb: readonly (number | null)[]): { hz: number; db: number } | null {
  let best: { hz: number; db: number } | null = null;
  leqDb.forEach((db, i) => {
    const hz = MEASUREMENT_BANDS_HZ[i];
    if (db === null || db === undefined || hz === undefined) return;
    if (!best || db > best.db) best = { hz, db };
  });
  return best;
}

/**
 * Each pin's latest reading. Measurements are pinned to a room and a point: one goes to the
 * nearest pin in its room (the pin's own room, or the room the pin stands in), or — with no room
 * — to a pin within 1.5 m of its point. Only finished measurements count.
 */
export function pinReadings(plan: Plan, measurements: readonly Measurement[]): Map<string, PinReading> {
  const pins = elementsOfType(plan, "pin").map((pin) => ({ pin, roomId: roomOfPin(plan, pin) }));
  const out = new Map<string, PinReading>();
  if (pins.length === 0) return out;
  for (const m of measurements) {
    if (m.status !== "ready") continue;
    const candidates = m.roomId ? pins.filter((p) => p.roomId === m.roomId) : m.point ? pins.filter((p) => distanceM(p.pin.position, m.point!) <= LOOSE_MATCH_M) : [];
    if (candidates.length === 0) continue;
    const at = m.point;
    const nearest = at ? candidates.reduce((a, b) => (distanceM(b.pin.position, at) < distanceM(a.pin.position, at) ? b : a)) : candidates[0]!;
    const held = out.get(nearest.pin.id);
    if (held && held.takenAt >= m.takenAt) continue;
    const peak = peakBand(m.leqDb);
    out.set(nearest.pin.id, {
      measurementId: m.id,
      label: m.label,
      takenAt: m.takenAt,
      laeqDb: m.summary?.laeqDb ?? aWeightedTotal(m.leqDb),
      peakBandHz: peak?.hz ?? null,
      peakDb: peak?.db ?? null,
    });
  }
  return out;
}

/** The short text drawn beside a pin: "48 dBA · peak 125 Hz". */
export function readingText(r: PinReading): string {
  const level = r.laeqDb === null ? "no level" : `${r.laeqDb.toFixed(0)} dBA`;
  if (r.peakBandHz === null) return level;
  const hz = r.peakBandHz >= 1000 ? `${r.peakBandHz / 1000} kHz` : `${r.peakBandHz} Hz`;
  return `${level} · peak ${hz}`;
}
