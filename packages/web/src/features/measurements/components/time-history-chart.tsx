import type { MeasurementDetail } from "@hushmark/schemas";
import { formatClock } from "./spectrum-math";

type History = NonNullable<MeasurementDetail["history"]>;
type NoiseEvent = NonNullable<MeasurementDetail["events"]>[number];

const W = 720;
const H = 190;
const M = { left: 44, right: 12, top: 10, bottom: 28 };
const MAX_POINTS = 1200;

/** A-weighted level per second with the events shaded and numbered; an event's shading plays it. */
export function TimeHistoryChart({ history, events, onPick }: { history: History; events: NoiseEvent[]; onPick: (index: number) => void }) {
  const n = history.laeqDb.length;
  const step = Math.max(1, Math.ceil(n / MAX_POINTS));
  const points: { t: number; db: number }[] = [];
  for (let i = 0; i < n; i += step) {
    let max = -Infinity;
    for (let j = i; j < Math.min(n, i + step); j++) max = Math.max(max, history.laeqDb[j]!);
    // Each value covers its interval, so it is drawn at the interval's middle.
    points.push({ t: (i + Math.min(step, n - i) / 2) * history.stepS, db: max });
  }
  const duration = Math.max(1, n * history.stepS);
  const lo = Math.floor((Math.min(...history.laeqDb) - 3) / 10) * 10;
  const hi = Math.ceil((Math.max(...history.lafmaxDb, ...history.laeqDb) + 3) / 10) * 10;
  const x = (t: number) => M.left + (t / duration) * (W - M.left - M.right);
  const y = (db: number) => M.top + (1 - (db - lo) / (hi - lo)) * (H - M.top - M.bottom);
  const ticks = Array.from({ length: 6 }, (_, i) => (duration * i) / 5);
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="w-full" role="img" aria-label="A-weighted level over time with the events" data-testid="time-history">
      <rect x={M.left} y={M.top} width={W - M.left - M.right} height={H - M.top - M.bottom} fill="#ffffff" stroke="#d9d4c7" />
      {[lo, (lo + hi) / 2, hi].map((t) => (
        <text key={t} x={M.left - 6} y={y(t) + 4} fontSize="11" textAnchor="end" fill="#6b7080">
          {Math.round(t)}
        </text>
      ))}
      {ticks.map((t) => (
        <text key={t} x={x(t)} y={H - 8} fontSize="11" textAnchor="middle" fill="#6b7080">
          {formatClock(t)}
        </text>
      ))}
      {events.map((e, i) => (
        <g key={i} onClick={() => onPick(i)} className="cursor-pointer" role="button" aria-label={`Event ${i + 1} at ${formatClock(e.startS)}`}>
          <rect x={x(e.startS)} width={Math.max(3, x(e.startS + e.durationS) - x(e.startS))} y={M.top} height={H - M.top - M.bottom} fill="#f1c27d" opacity="0.55" />
          <text x={x(e.startS) + 2} y={M.top + 12} fontSize="11" fontWeight="600" fill="#7a1f3d">
            {i + 1}
          </text>
        </g>
      ))}
      <polyline points={points.map((p) => `${x(p.t)},${y(p.db)}`).join(" ")} fill="none" stroke="#1f7a74" strokeWidth="1.5" />
      <text x={W - M.right - 4} y={M.top + 12} fontSize="11" textAnchor="end" fill="#6b7080">
        LAeq per {history.stepS} s, dBA
      </text>
    </svg>
  );
}
