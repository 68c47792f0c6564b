import { useMemo, useRef } from "react";
import type { Plan } from "@hushmark/floorplan";
import { useMeasurements } from "../../measurements/api/measurements";
import { pinReadings, readingText, type PinReading } from "../model/pin-readings";

export interface PinReadings {
  /** The latest reading at each pin, by pin id. */
  byPin: ReadonlyMap<string, PinReading>;
  /** The same as the short text drawn beside the pin. */
  texts: ReadonlyMap<string, string>;
}

const EMPTY: PinReadings = { byPin: new Map(), texts: new Map() };

/**
 * The project's measurements matched to the plan's pins. Worked out again only when the pins or
 * rooms change (the elements record) or new measurements arrive, not on every render.
 */
export function usePinReadings(projectId: string, plan: Plan): PinReadings {
  const measurements = useMeasurements(projectId);
  const data = measurements.data;
  const elements = plan.elements;
  const last = useRef<{ key: string; value: PinReadings }>({ key: "", value: EMPTY });
  // The plan matters only through its elements (pins and rooms).
  return useMemo(() => {
    if (!data?.length) return EMPTY;
    const byPin = pinReadings(plan, data);
    if (byPin.size === 0) return EMPTY;
    // A drag changes the elements on every move; the same readings keep the same object, so the
    // labels layer is not redrawn for them.
    const key = [...byPin].map(([id, r]) => `${id}=${r.measurementId}:${r.label}:${r.takenAt}:${r.laeqDb}:${r.peakBandHz}:${r.peakDb}`).join("|");
    if (key === last.current.key) return last.current.value;
    const value = { byPin, texts: new Map([...byPin].map(([id, r]) => [id, readingText(r)])) };
    last.current = { key, value };
    return value;
  }, [elements, data]);
}
