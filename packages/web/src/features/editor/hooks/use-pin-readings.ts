import { useMemo } from "react";
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
  return useMemo(() => {
    if (!data?.length) return EMPTY;
    const byPin = pinReadings(plan, data);
    if (byPin.size === 0) return EMPTY;
    return { byPin, texts: new Map([...byPin].map(([id, r]) => [id, readingText(r)])) };
    // The plan matters only through its elements (pins and rooms).
  }, [elements, data]);
}
