import { aWeightedTotal, bandEdges, BANDS_HZ, formatHz, ncCurves, octaveSteps } from "./spectrum-math";

export interface SpectrumSeries {
  label: string;
  colour: string;
  leqDb: readonly (number | null)[];
  lmaxDb?: readonly (number | null)[] | null;
}

const W = 720;
const H = 300;
const M = { left: 44, right: 56, top: 24, bottom: 30 };
const F_MIN = 40;
const F_MAX = 6300;
const X_TICKS = [63, 125, 250, 500, 1000, 2000, 4000];
const NC_SHOWN = [20, 30, 40, 50, 60];

const x = (hz: number) => M.left + ((Math.log10(hz) - Math.log10(F_MIN)) / (Math.log10(F_MAX) - Math.log10(F_MIN))) * (W - M.left - M.right);

/**
 * Band levels on a log-frequency axis: bars with a peak-hold tick for one spectrum, lines for
 * several; NC curves drawn as reference lines, with one spectrum's octave-band levels as steps,
 * since NC compares octaves and a third-octave bar sits about 5 dB below its octave; the
 * A-weighted total in the legend.
 */
export function SpectrumChart({ series, showNc = true, title }: { series: SpectrumSeries[]; showNc?: boolean; title: string }) {
  const values = series.flatMap((s) => [...s.leqDb, ...(s.lmaxDb ?? [])]).filter((v): v is number => v !== null && v !== undefined);
  const hi = values.length ? Math.ceil((Math.max(...values) + 5) / 10) * 10 : 80;
  // At most 100 dB of range, so a band of near-silence does not flatten everything else.
  const lo = values.length ? Math.max(hi - 100, Math.floor((Math.min(...values) - 5) / 10) * 10) : 0;
  const y = (db: number) => M.top + (1 - (db - lo) / (hi - lo)) * (H - M.top - M.bottom);
  const yTicks = Array.from({ length: (hi - lo) / 10 + 1 }, (_, i) => lo + i * 10);
  const single = series.length === 1;
  const clip = (db: number) => Math.max(lo, Math.min(hi, db));
  const steps = showNc && single && series[0] ? octaveSteps(series[0].leqDb).filter((o) => o.db !== null) : [];

  return (
    <figure className="flex max-w-[880px] flex-col gap-2">
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full" role="img" aria-label={title} data-testid="spectrum-chart">
        <rect x={M.left} y={M.top} width={W - M.left - M.right} height={H - M.top - M.bottom} fill="#ffffff" stroke="#d9d4c7" />
        {yTicks.map((t) => (
          <g key={t}>
            <line x1={M.left} x2={W - M.right} y1={y(t)} y2={y(t)} stroke="#ece8df" />
            <text x={M.left - 6} y={y(t) + 4} fontSize="11" textAnchor="end" fill="#6b7080" className="tabular-nums">
              {t}
            </text>
          </g>
        ))}
        {X_TICKS.map((f) => (
          <g key={f}>
            <line x1={x(f)} x2={x(f)} y1={M.top} y2={H - M.bottom} stroke="#ece8df" />
            <text x={x(f)} y={H - M.bottom + 16} fontSize="11" textAnchor="middle" fill="#6b7080">
              {formatHz(f)}
            </text>
          </g>
        ))}
        <text x={W - M.right + 4} y={H - M.bottom + 16} fontSize="11" fill="#6b7080">
          Hz
        </text>
        <text x={M.left - 6} y={12} fontSize="11" textAnchor="end" fill="#6b7080">
          dB
        </text>
        {showNc
          ? ncCurves
              .filter((c) => NC_SHOWN.includes(c.nc))
              .map((c) => {
                const pts = c.points.filter((p) => p.hz <= F_MAX && p.db >= lo && p.db <= hi);
                if (pts.length < 2) return null;
                const last = pts[pts.length - 1]!;
                // Labels sit in the right margin so they never cover the bars.
                return (
                  <g key={c.nc} data-testid="nc-curve">
                    <polyline points={pts.map((p) => `${x(p.hz)},${y(p.db)}`).join(" ")} fill="none" stroke="#9aa0ad" strokeDasharray="4 3" strokeWidth="1" />
                    <line x1={x(last.hz)} x2={W - M.right} y1={y(last.db)} y2={y(last.db)} stroke="#9aa0ad" strokeDasharray="4 3" strokeWidth="1" />
                    <text x={W - M.right + 4} y={y(last.db) + 4} fontSize="10" fill="#6b7080">
                      NC-{c.nc}
                    </text>
                  </g>
                );
              })
          : null}
        {series.map((s, si) =>
          single ? (
            <g key={si}>
              {s.leqDb.map((v, i) => {
                if (v === null || v === undefined) return null;
                const e = bandEdges[i]!;
                const x0 = x(e.lowerHz) + 1.5;
                const x1 = x(e.upperHz) - 1.5;
                const peak = s.lmaxDb?.[i];
                return (
                  <g key={i}>
                    <rect x={x0} width={Math.max(1, x1 - x0)} y={y(clip(v))} height={Math.max(0, y(lo) - y(clip(v)))} fill={s.colour} opacity="0.85">
                      <title>{`${BANDS_HZ[i]} Hz: ${v.toFixed(1)} dB`}</title>
                    </rect>
                    {peak !== null && peak !== undefined ? <line x1={x0} x2={x1} y1={y(clip(peak))} y2={y(clip(peak))} stroke="#1d2433" strokeWidth="2.5" /> : null}
                  </g>
                );
              })}
            </g>
          ) : (
            <g key={si}>
              <polyline
                points={s.leqDb.flatMap((v, i) => (v === null || v === undefined ? [] : [`${x(BANDS_HZ[i]!)},${y(clip(v))}`])).join(" ")}
                fill="none"
                stroke={s.colour}
                strokeWidth="2.5"
              />
              {s.leqDb.map((v, i) => (v === null || v === undefined ? null : <circle key={i} cx={x(BANDS_HZ[i]!)} cy={y(clip(v))} r="3" fill={s.colour} />))}
            </g>
          ),
        )}
        {steps.map((o) => (
          <line key={o.hz} data-testid="octave-step" x1={x(o.lowerHz)} x2={x(o.upperHz)} y1={y(clip(o.db!))} y2={y(clip(o.db!))} stroke="#7a1f3d" strokeWidth="2">
            <title>{`${formatHz(o.hz)} Hz octave: ${o.db!.toFixed(1)} dB`}</title>
          </line>
        ))}
      </svg>
      <figcaption className="flex flex-wrap gap-x-5 gap-y-1 text-sm">
        {series.map((s, i) => (
          <span key={i} className="inline-flex items-center gap-2">
            <span className="inline-block size-3 rounded-sm" style={{ background: s.colour }} aria-hidden />
            <span>{s.label}</span>
            <span className="font-semibold tabular-nums" data-testid="a-weighted-total">
              {aWeightedTotal(s.leqDb)?.toFixed(1) ?? "—"} dBA
            </span>
          </span>
        ))}
        {single && series[0]?.lmaxDb ? (
          <span className="inline-flex items-center gap-2 text-muted">
            <span className="inline-block h-0.5 w-4 bg-ink" aria-hidden /> peak hold (Lmax)
          </span>
        ) : null}
        {steps.length ? (
          <span className="inline-flex items-center gap-2 text-muted">
            <span className="inline-block h-0 w-4 border-t-2" style={{ borderColor: "#7a1f3d" }} aria-hidden /> octave bands, which NC compares
          </span>
        ) : null}
        {showNc ? <span className="text-muted">dashed: NC reference curves (octave bands)</span> : null}
      </figcaption>
    </figure>
  );
}
