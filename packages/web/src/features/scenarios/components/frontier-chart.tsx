import type { OptionSearchResult } from "@hushmark/schemas";
import { formatMoney } from "../../price-book/components/money";

interface Point {
  cost: number;
  dba: number;
  label: string;
}

/** Cost against received level: the frontier as a stepped line, the target as a dashed line, scenarios as rings. */
export function FrontierChart({ frontier, scenarios, targetDba, baseDba, currency }: { frontier: OptionSearchResult["frontier"]; scenarios: Point[]; targetDba: number | null; baseDba: number; currency: string }) {
  const W = 560, H = 260, L = 56, R = 12, T = 12, B = 40;
  const pts = frontier.points;
  const all = [...pts.map((p) => ({ cost: p.cost, dba: p.dba })), ...scenarios, { cost: 0, dba: baseDba }];
  const maxCost = Math.max(1, ...all.map((p) => p.cost)) * 1.05;
  const dbas = all.map((p) => p.dba).concat(targetDba !== null ? [targetDba] : []);
  const lo = Math.floor(Math.min(...dbas) - 1), hi = Math.ceil(Math.max(...dbas) + 1);
  const x = (c: number) => L + (c / maxCost) * (W - L - R);
  const y = (d: number) => T + ((hi - d) / Math.max(hi - lo, 1)) * (H - T - B);
  const path = pts.map((p, i) => `${i === 0 ? "M" : "L"}${x(p.cost).toFixed(1)},${y(p.dba).toFixed(1)}`).join(" ");
  const ticksY = Array.from({ length: 5 }, (_, i) => lo + ((hi - lo) * i) / 4);
  const ticksX = Array.from({ length: 5 }, (_, i) => (maxCost * i) / 4);
  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-[640px]" role="img" aria-label="Cost against the level reaching the room for the best sets of upgrades">
        {ticksY.map((d) => (
          <g key={`y${d}`}>
            <line x1={L} x2={W - R} y1={y(d)} y2={y(d)} stroke="#d9d4c7" strokeWidth={0.5} />
            <text x={L - 6} y={y(d) + 4} textAnchor="end" fontSize={11} fill="#6b7080">{d.toFixed(0)}</text>
          </g>
        ))}
        {ticksX.map((c) => (
          <text key={`x${c}`} x={x(c)} y={H - B + 16} textAnchor="middle" fontSize={11} fill="#6b7080">{formatMoney(Math.round(c), currency).replace(/\.00$/, "")}</text>
        ))}
        <text x={12} y={T + 4} fontSize={11} fill="#6b7080" transform={`rotate(-90 12 ${T + 4})`} textAnchor="end">dBA in the room</text>
        <text x={(L + W - R) / 2} y={H - 4} fontSize={11} fill="#6b7080" textAnchor="middle">cost</text>
        {targetDba !== null ? (
          <g>
            <line x1={L} x2={W - R} y1={y(targetDba)} y2={y(targetDba)} stroke="#2f8f4e" strokeDasharray="6 4" strokeWidth={1.5} />
            <text x={W - R} y={y(targetDba) - 4} textAnchor="end" fontSize={11} fill="#2f8f4e">target {targetDba.toFixed(0)} dBA</text>
          </g>
        ) : null}
        <path d={path} fill="none" stroke="#1f7a74" strokeWidth={2} />
        {pts.map((p, i) => (
          <circle key={i} cx={x(p.cost)} cy={y(p.dba)} r={3.5} fill="#1f7a74">
            <title>{`${formatMoney(p.cost, currency)} → ${p.dba.toFixed(1)} dBA: ${p.items.join(", ") || "as it is"}`}</title>
          </circle>
        ))}
        {scenarios.map((s, i) => (
          <g key={`${s.label}-${i}`}>
            <circle cx={x(s.cost)} cy={y(s.dba)} r={6} fill="none" stroke="#c98a12" strokeWidth={2} />
            {/* Labels alternate above and below so neighbouring scenarios stay readable. */}
            <text x={x(s.cost) + 8} y={y(s.dba) + (i % 2 === 0 ? -8 : 16)} fontSize={11} fill="#1d2433">{s.label}</text>
          </g>
        ))}
      </svg>
      <figcaption className="text-sm text-muted">
        The line joins the cheapest set of upgrades for each level{frontier.exact ? "" : " (sampled: many combinations)"}; rings are your saved scenarios{targetDba !== null ? "; the dashed line is the target" : ""}.
      </figcaption>
    </figure>
  );
}
