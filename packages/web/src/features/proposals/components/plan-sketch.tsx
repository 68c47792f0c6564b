import { elementsOfType, parsePlan, planWallPieces, polygonCentroid } from "@hushmark/floorplan";
import { useMemo } from "react";

/** A read-only outline of the plan's level with the quiet room shaded and numbered markers on the upgraded elements. */
export function PlanSketch({ document, receiverId, marked }: { document: Record<string, unknown>; receiverId: string; marked: string[] }) {
  const drawing = useMemo(() => {
    const parsed = parsePlan(document);
    if (!parsed.ok) return null;
    const plan = parsed.plan;
    const rooms = elementsOfType(plan, "room");
    const levelId = rooms.find((r) => r.id === receiverId)?.levelId ?? rooms[0]?.levelId;
    const here = rooms.filter((r) => r.levelId === levelId);
    const pieces = planWallPieces(plan).filter((p) => p.levelId === levelId);
    const xs = here.flatMap((r) => r.outline.map((v) => v.x));
    const ys = here.flatMap((r) => r.outline.map((v) => v.y));
    if (!xs.length) return null;
    const box = { minX: Math.min(...xs) - 0.5, maxX: Math.max(...xs) + 0.5, minY: Math.min(...ys) - 0.5, maxY: Math.max(...ys) + 0.5 };
    const spot = (id: string): { x: number; y: number } | null => {
      const el = plan.elements[id] as { type: string; wallRef?: string; offsetM?: number; widthM?: number; position?: { x: number; y: number } } | undefined;
      const piece = pieces.find((p) => p.id === id || (el?.wallRef && p.id.split("|").some((s) => s === el.wallRef)));
      if (el?.position) return el.position;
      if (piece) return { x: (piece.start.x + piece.end.x) / 2, y: (piece.start.y + piece.end.y) / 2 };
      const vents = Object.values(plan.elements).filter((e) => e.type === "vent") as { spaceId?: string; position?: { x: number; y: number } }[];
      const duct = el?.type === "duct" ? vents.find((v) => v.spaceId === receiverId) ?? vents[0] : undefined;
      return duct?.position ?? null;
    };
    return { here, pieces, box, markers: marked.map((id, i) => ({ id, n: i + 1, at: spot(id) })) };
  }, [document, receiverId, marked]);
  if (!drawing) return null;
  const { box } = drawing;
  const w = box.maxX - box.minX, h = box.maxY - box.minY;
  const y = (v: number) => box.maxY - v + box.minY;
  return (
    <svg viewBox={`${box.minX} ${box.minY} ${w} ${h}`} className="max-h-80 w-full rounded-md border border-rule bg-paper" role="img" aria-label="Plan with the upgraded elements numbered">
      {drawing.here.map((r) => (
        <g key={r.id}>
          <polygon points={r.outline.map((v) => `${v.x},${y(v.y)}`).join(" ")} fill={r.id === receiverId ? "#d6ebe9" : "#ffffff"} stroke="none" />
          <text x={polygonCentroid(r.outline).x} y={y(polygonCentroid(r.outline).y)} fontSize={Math.max(w, h) / 40} textAnchor="middle" fill="#1d2433">{r.name}</text>
        </g>
      ))}
      {drawing.pieces.map((p) => <line key={p.id} x1={p.start.x} y1={y(p.start.y)} x2={p.end.x} y2={y(p.end.y)} stroke="#1d2433" strokeWidth={0.12} />)}
      {drawing.markers.map((m) => m.at ? (
        <g key={m.id}>
          <circle cx={m.at.x} cy={y(m.at.y)} r={Math.max(w, h) / 45} fill="#1f7a74" stroke="#fff" strokeWidth={0.05} />
          <text x={m.at.x} y={y(m.at.y) + Math.max(w, h) / 120} fontSize={Math.max(w, h) / 45} textAnchor="middle" fill="#fff" fontWeight={600}>{m.n}</text>
        </g>
      ) : null)}
    </svg>
  );
}
