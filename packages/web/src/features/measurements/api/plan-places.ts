import { usePlan } from "../../projects/api/get-plan";

export interface PlanPlaces {
  rooms: { id: string; name: string; levelId: string | null; outline: { x: number; y: number }[]; centre: { x: number; y: number } | null }[];
  levels: { id: string; name: string }[];
  elements: { id: string; label: string }[];
  nameOf: (id: string | null) => string | null;
}

interface LooseElement {
  id?: string;
  type?: string;
  name?: string;
  outline?: { x: number; y: number }[];
  levelId?: string;
}

const NOT_ELEMENTS = new Set(["level", "room", "note", "tape", "pin"]);

/** Rooms and elements of the project's current plan, to pin measurements and photos to. */
export function usePlanPlaces(projectId: string): PlanPlaces {
  const plan = usePlan(projectId);
  const elements = Object.entries(((plan.data?.document as { elements?: Record<string, LooseElement> } | undefined)?.elements ?? {}));
  const rooms = elements
    .filter(([, e]) => e.type === "room")
    .map(([id, e]) => {
      const pts = e.outline ?? [];
      const centre = pts.length ? { x: pts.reduce((s, p) => s + p.x, 0) / pts.length, y: pts.reduce((s, p) => s + p.y, 0) / pts.length } : null;
      return { id, name: e.name || id, levelId: e.levelId ?? null, outline: pts.map((p) => ({ x: p.x, y: p.y })), centre };
    });
  const others = elements.filter(([, e]) => e.type && !NOT_ELEMENTS.has(e.type)).map(([id, e]) => ({ id, label: `${e.name || id} (${e.type})` }));
  const names = new Map<string, string>([...rooms.map((r) => [r.id, r.name] as const), ...others.map((o) => [o.id, o.label] as const)]);
  const levels = elements.filter(([, e]) => e.type === "level").map(([id, e]) => ({ id, name: e.name || id }));
  return { rooms, levels, elements: others, nameOf: (id) => (id ? (names.get(id) ?? id) : null) };
}
