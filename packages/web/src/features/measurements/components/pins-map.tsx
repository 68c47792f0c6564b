import type { Measurement } from "@hushmark/schemas";
import { useState } from "react";
import { Card, CardHeader } from "../../../components/ui/card";
import { Select } from "../../../components/ui/field";
import type { PlanPlaces } from "../api/plan-places";
import { aWeightedTotal } from "./spectrum-math";

const W = 640;
const H = 360;
const PAD = 28;

/** The plan's rooms with the measurement pins: rings with the reading beside them; a pin selects its measurement. */
export function PinsMap({ places, measurements, selected, onSelect }: { places: PlanPlaces; measurements: Measurement[]; selected: string | null; onSelect: (id: string) => void }) {
  const pinned = measurements.filter((m) => m.point && m.roomId);
  const levelOf = (m: Measurement) => places.rooms.find((r) => r.id === m.roomId)?.levelId ?? null;
  const levelIds = [...new Set(places.rooms.map((r) => r.levelId))];
  const busiest = levelIds.sort((a, b) => pinned.filter((m) => levelOf(m) === b).length - pinned.filter((m) => levelOf(m) === a).length)[0] ?? null;
  // Until the person picks a storey, follow the one with the most pins (the plan may arrive after the list).
  const [chosen, setLevel] = useState<string | null | undefined>(undefined);
  const level = chosen === undefined ? busiest : chosen;
  const rooms = places.rooms.filter((r) => r.levelId === level && r.outline.length >= 3);
  if (rooms.length === 0) return null;
  const pts = rooms.flatMap((r) => r.outline);
  const minX = Math.min(...pts.map((p) => p.x));
  const maxX = Math.max(...pts.map((p) => p.x));
  const minY = Math.min(...pts.map((p) => p.y));
  const maxY = Math.max(...pts.map((p) => p.y));
  const scale = Math.min((W - 2 * PAD) / Math.max(0.1, maxX - minX), (H - 2 * PAD) / Math.max(0.1, maxY - minY));
  const x = (v: number) => PAD + (v - minX) * scale;
  // Plan y points north (up), as in the Sketch; SVG y points down.
  const y = (v: number) => PAD + (maxY - v) * scale;
  const here = pinned.filter((m) => levelOf(m) === level);
  const levelName = (id: string | null) => places.levels.find((l) => l.id === id)?.name ?? "Plan";

  return (
    <Card>
      <CardHeader
        title="Where they were taken"
        description={here.length ? `${here.length} pinned on ${levelName(level)}` : `Nothing pinned on ${levelName(level)} yet`}
        actions={levelIds.length > 1 ? <div className="w-48"><Select label="Storey" value={level ?? ""} onChange={(e) => setLevel(e.target.value || null)} options={levelIds.map((id) => ({ value: id ?? "", label: levelName(id) }))} /></div> : undefined}
      />
      <div className="p-4">
        <svg viewBox={`0 0 ${W} ${(maxY - minY) * scale + 2 * PAD}`} className="w-full max-w-[880px]" role="img" aria-label="Plan with the measurement pins" data-testid="pins-map">
          {rooms.map((r) => (
            <g key={r.id}>
              <polygon points={r.outline.map((p) => `${x(p.x)},${y(p.y)}`).join(" ")} fill="#ffffff" stroke="#1d2433" strokeWidth="3" strokeLinejoin="round" />
              {r.centre ? <text x={x(r.centre.x)} y={y(r.centre.y) + 22} fontSize="12" textAnchor="middle" fill="#6b7080">{r.name}</text> : null}
            </g>
          ))}
          {here.map((m) => {
            const reading = m.summary?.laeqDb ?? aWeightedTotal(m.leqDb);
            const on = m.id === selected;
            return (
              <g key={m.id} onClick={() => onSelect(m.id)} className="cursor-pointer" role="button" aria-label={`Show ${m.label}`}>
                <circle cx={x(m.point!.x)} cy={y(m.point!.y)} r={on ? 9 : 7} fill={on ? "#1f7a74" : "#ffffff"} stroke="#1f7a74" strokeWidth="3" />
                <text x={x(m.point!.x) + 12} y={y(m.point!.y) + 4} fontSize="13" fontWeight="600" fill="#1d2433" className="tabular-nums">
                  {reading !== null && reading !== undefined ? `${reading.toFixed(0)} dBA` : m.label}
                </text>
              </g>
            );
          })}
        </svg>
      </div>
    </Card>
  );
}
