import { ncCurveDb } from "@hushmark/acoustics";
import type { AnalysisResult } from "@hushmark/schemas";

const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000];

/**
 * The level reaching the receiver in each one-third-octave band (bars) against the target's NC
 * curve (line), frequency on a log axis. A table follows for screen readers.
 */
export function SpectrumChart({ result, dimmed }: { result: AnalysisResult; dimmed: boolean }) {
  const W = 300, H = 170, L = 30, B = 22, T = 8, R = 6;
  const bands = result.bandsHz;
  const levels = result.receiver.levelsDb;
  const nc = result.target?.kind === "nc" ? result.target.value : null;
  const curve = nc !== null ? ncCurveDb(nc) : null;
  const all = [...levels, ...(curve ?? [])].filter(Number.isFinite);
  const top = Math.ceil((Math.max(40, ...all) + 5) / 10) * 10;
  const bottom = Math.max(-10, Math.floor((Math.min(...all, 0) - 5) / 10) * 10);
  const fx = (hz: number) => L + ((Math.log10(hz) - Math.log10(40)) / (Math.log10(9000) - Math.log10(40))) * (W - L - R);
  const fy = (db: number) => T + ((top - db) / (top - bottom)) * (H - T - B);
  const barW = (W - L - R) / 30;
  const ticks = [];
  for (let d = bottom; d <= top; d += 10) ticks.push(d);
  return (
    <figure className={dimmed ? "opacity-40 transition-opacity" : "transition-opacity"}>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-[380px]" role="img" aria-label={`Level reaching ${result.receiver.name} by frequency${nc !== null ? `, against the NC ${nc} curve` : ""}`}>
        {ticks.map((d) => (
          <g key={d}>
            <line x1={L} x2={W - R} y1={fy(d)} y2={fy(d)} stroke="#d9d4c7" strokeWidth={0.5} />
            <text x={L - 4} y={fy(d) + 3} textAnchor="end" fontSize={8} fill="#6b7080">{d}</text>
          </g>
        ))}
        {bands.map((hz, i) => {
          const v = levels[i];
          if (v === undefined || !Number.isFinite(v)) return null;
          const y = fy(Math.max(v, bottom));
          return <rect key={hz} x={fx(hz) - barW / 2} y={y} width={barW} height={fy(bottom) - y} fill="#1f7a74" opacity={0.75} />;
        })}
        {curve ? <polyline points={OCTAVES_HZ.map((hz, i) => `${fx(hz)},${fy(curve[i]!)}`).join(" ")} fill="none" stroke="#c2412d" strokeWidth={1.8} strokeDasharray="5 3" /> : null}
        {OCTAVES_HZ.map((hz) => <text key={hz} x={fx(hz)} y={H - 8} textAnchor="middle" fontSize={8} fill="#6b7080">{hz >= 1000 ? `${hz / 1000}k` : hz}</text>)}
        <text x={L} y={H - 0.5} fontSize={8} fill="#6b7080">Hz</text>
        <text x={2} y={T + 4} fontSize={8} fill="#6b7080">dB</text>
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-3 text-[12px] text-muted">
        <span className="inline-flex items-center gap-1"><span className="inline-block h-2.5 w-3 bg-brand/75" aria-hidden="true" /> Level in the room, per one-third octave</span>
        {curve ? <span className="inline-flex items-center gap-1"><span className="inline-block h-0 w-4 border-t-2 border-dashed border-danger" aria-hidden="true" /> NC {nc} target</span> : null}
      </figcaption>
      <table className="sr-only">
        <caption>Level reaching the room by band</caption>
        <thead><tr><th>Band, Hz</th><th>Level, dB</th></tr></thead>
        <tbody>{bands.map((hz, i) => <tr key={hz}><td>{hz}</td><td>{levels[i]?.toFixed(1)}</td></tr>)}</tbody>
      </table>
    </figure>
  );
}
