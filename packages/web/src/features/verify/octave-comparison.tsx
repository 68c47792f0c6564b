import { ncCurveDb, spectrum, thirdOctaveToOctave } from "@hushmark/acoustics";
import type { Verification } from "@hushmark/schemas";

const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000];
const octaves = (thirds: readonly number[]) => (thirds.length === 21 ? thirdOctaveToOctave(spectrum("third-octave", thirds)).values.slice(0, 7) : null);

interface Series { label: string; colour: string; dash?: boolean; values: number[] }

/** The verification's series in octave bands (how NC is judged): measured, predicted and the target. */
export function verificationSeries(v: Verification): Series[] {
  const before = octaves(v.bands.beforeDb), after = octaves(v.bands.afterDb), predicted = octaves(v.bands.predictedAfterDb);
  return [
    ...(before ? [{ label: "Measured before", colour: "#6b7080", values: before }] : []),
    ...(after ? [{ label: "Measured after", colour: "#1f7a74", values: after }] : []),
    ...(predicted ? [{ label: "Predicted after", colour: "#1f7a74", dash: true, values: predicted }] : []),
    ...(v.target?.kind === "nc" ? [{ label: `NC ${v.target.value} target`, colour: "#c2412d", dash: true, values: ncCurveDb(v.target.value).slice(0, 7) }] : []),
  ];
}

/**
 * Measured before and after, the prediction and the NC target by octave band 63 Hz–4 kHz, as
 * lines, with the figures in a table that can be opened (and is always there for screen readers).
 */
export function OctaveComparison({ v }: { v: Verification }) {
  const series = verificationSeries(v);
  if (series.length < 2) return null;
  const W = 420, H = 190, L = 30, R = 8, T = 8, B = 22;
  const all = series.flatMap((s) => s.values).filter(Number.isFinite);
  const top = Math.ceil((Math.max(40, ...all) + 5) / 10) * 10;
  const bottom = Math.max(0, Math.floor((Math.min(...all) - 5) / 10) * 10);
  const fx = (i: number) => L + (i / (OCTAVES_HZ.length - 1)) * (W - L - R);
  const fy = (db: number) => T + ((top - db) / (top - bottom)) * (H - T - B);
  const ticks: number[] = [];
  for (let d = bottom; d <= top; d += 10) ticks.push(d);
  return (
    <figure className="flex flex-col gap-2">
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-[520px]" role="img" aria-label="Octave-band levels measured before and after the work, with the prediction and the target">
        {ticks.map((d) => (
          <g key={d}>
            <line x1={L} x2={W - R} y1={fy(d)} y2={fy(d)} stroke="#d9d4c7" strokeWidth={0.5} />
            <text x={L - 4} y={fy(d) + 3} textAnchor="end" fontSize={9} fill="#6b7080">{d}</text>
          </g>
        ))}
        {OCTAVES_HZ.map((hz, i) => <text key={hz} x={fx(i)} y={H - 6} textAnchor="middle" fontSize={9} fill="#6b7080">{hz >= 1000 ? `${hz / 1000}k` : hz}</text>)}
        <text x={2} y={T + 4} fontSize={9} fill="#6b7080">dB</text>
        {series.map((s) => (
          <g key={s.label} data-series={s.label}>
            <polyline points={s.values.map((v, i) => `${fx(i)},${fy(Math.max(v, bottom))}`).join(" ")} fill="none" stroke={s.colour} strokeWidth={s.dash ? 1.6 : 2.2} strokeDasharray={s.dash ? "5 3" : undefined} />
            {s.dash ? null : s.values.map((v, i) => <circle key={i} cx={fx(i)} cy={fy(Math.max(v, bottom))} r={2.4} fill={s.colour} />)}
          </g>
        ))}
      </svg>
      <figcaption className="flex flex-wrap gap-x-4 gap-y-1 text-[12px] text-muted">
        {series.map((s) => (
          <span key={s.label} className="inline-flex items-center gap-1.5">
            <span className="inline-block h-0 w-5 border-t-2" style={{ borderColor: s.colour, borderTopStyle: s.dash ? "dashed" : "solid" }} aria-hidden="true" />
            {s.label}
          </span>
        ))}
        <span>· octave bands, Hz</span>
      </figcaption>
      <details className="text-sm">
        <summary className="min-h-9 cursor-pointer content-center font-medium text-brand">Figures by octave band</summary>
        <div className="overflow-x-auto">
          <table className="mt-1 tabular-nums">
            <caption className="sr-only">Octave-band levels, dB</caption>
            <thead><tr><th scope="col" className="pr-3 text-left font-medium text-muted">Octave, Hz</th>{OCTAVES_HZ.map((hz) => <th key={hz} scope="col" className="px-2 text-right font-medium text-muted">{hz}</th>)}</tr></thead>
            <tbody>
              {series.map((s) => (
                <tr key={s.label}><th scope="row" className="pr-3 text-left font-normal">{s.label}</th>{s.values.map((v, i) => <td key={i} className="px-2 text-right">{v.toFixed(1)}</td>)}</tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </figure>
  );
}
