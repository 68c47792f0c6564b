import { bandEdgesHz, ncCurveDb, spectrum, thirdOctaveToOctave } from "@hushmark/acoustics";
import type { AnalysisResult } from "@hushmark/schemas";

const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000];
/** The octaves the third-octave bands 50–5000 Hz fill (the 8 kHz octave has no data). */
const FILLED_OCTAVES = 7;

/**
 * The level reaching the receiver in each one-third-octave band (bars), with the octave-band
 * levels (steps) that the NC rating compares with the target's NC curve (dashed line), frequency
 * on a log axis. Third-octave bars sit about 5 dB below their octave, so they are never set
 * against the curve on their own. A table follows for screen readers.
 */
export function SpectrumChart({ result, dimmed }: { result: AnalysisResult; dimmed: boolean }) {
  const W = 300, H = 170, L = 30, B = 22, T = 8, R = 6;
  const bands = result.bandsHz;
  const levels = result.receiver.levelsDb;
  const nc = result.target?.kind === "nc" ? result.target.value : null;
  const curve = nc !== null ? ncCurveDb(nc).slice(0, FILLED_OCTAVES) : null;
  const octaves = levels.length === 21 ? thirdOctaveToOctave(spectrum("third-octave", levels)).values.slice(0, FILLED_OCTAVES) : null;
  const all = [...levels, ...(curve ?? []), ...(octaves ?? [])].filter(Number.isFinite);
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
        {octaves ? (
          <polyline
            data-part="octaves"
            points={octaves.flatMap((v, i) => {
              const { lowerHz, upperHz } = bandEdgesHz(OCTAVES_HZ[i]!, 1);
              const y = fy(Math.max(v, bottom));
              return [`${fx(lowerHz)},${y}`, `${fx(upperHz)},${y}`];
            }).join(" ")}
            fill="none" stroke="#1d2433" strokeWidth={1.4}
          />
        ) : null}
        {curve ? <polyline points={curve.map((v, i) => `${fx(OCTAVES_HZ[i]!)},${fy(v)}`).join(" ")} fill="none" stroke="#c2412d" strokeWidth={1.8} strokeDasharray="5 3" /> : null}
        {OCTAVES_HZ.map((hz) => <text key={hz} x={fx(hz)} y={H - 8} textAnchor="middle" fontSize={8} fill="#6b7080">{hz >= 1000 ? `${hz / 1000}k` : hz}</text>)}
        <text x={L} y={H - 0.5} fontSize={8} fill="#6b7080">Hz</text>
        <text x={2} y={T + 4} fontSize={8} fill="#6b7080">dB</text>
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-3 text-[12px] text-muted">
        <span className="inline-flex items-center gap-1"><span className="inline-block h-2.5 w-3 bg-brand/75" aria-hidden="true" /> Level in the room, per one-third octave</span>
        {octaves ? <span className="inline-flex items-center gap-1"><span className="inline-block h-0 w-4 border-t-2 border-ink" aria-hidden="true" /> per octave{curve ? ", as NC compares" : ""}</span> : null}
        {curve ? <span className="inline-flex items-center gap-1"><span className="inline-block h-0 w-4 border-t-2 border-dashed border-danger" aria-hidden="true" /> NC {nc} target</span> : null}
      </figcaption>
      <table className="sr-only">
        <caption>Level reaching the room by band</caption>
        <thead><tr><th>Band, Hz</th><th>Level, dB</th></tr></thead>
        <tbody>{bands.map((hz, i) => <tr key={hz}><td>{hz}</td><td>{levels[i]?.toFixed(1)}</td></tr>)}</tbody>
      </table>
      {octaves ? (
        <table className="sr-only">
          <caption>Level reaching the room by octave band{curve ? `, against the NC ${nc} curve` : ""}</caption>
          <thead><tr><th>Octave, Hz</th><th>Level, dB</th>{curve ? <th>NC {nc}, dB</th> : null}</tr></thead>
          <tbody>{octaves.map((v, i) => <tr key={OCTAVES_HZ[i]}><td>{OCTAVES_HZ[i]}</td><td>{v.toFixed(1)}</td>{curve ? <td>{curve[i]!.toFixed(1)}</td> : null}</tr>)}</tbody>
        </table>
      ) : null}
    </figure>
  );
}
