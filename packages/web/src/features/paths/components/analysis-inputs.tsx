import { useId } from "react";
import { elementsOfType, sourceLibrary, type Plan } from "@hushmark/floorplan";
import type { AnalysisTarget } from "@hushmark/schemas";

export interface PathInputs {
  sourceKind: "airborne" | "impact";
  sourceId: string;
  spectrumId: string;
  receiverId: string;
  target: AnalysisTarget | null;
}

const NOISY = new Set(["cafe", "kitchen", "plant", "cinema", "retail", "classroom", "living"]);

/** A sensible first question for a plan: the noisiest-sounding room into the room with a target. */
export function defaultInputs(plan: Plan): PathInputs | null {
  const rooms = elementsOfType(plan, "room");
  if (rooms.length < 1) return null;
  const receiver = rooms.find((r) => r.target) ?? rooms[0]!;
  const source = rooms.find((r) => r.id !== receiver.id && NOISY.has(r.use)) ?? rooms.find((r) => r.id !== receiver.id);
  const sourceId = source?.id ?? "outdoors";
  const spectrumId = source?.use === "cafe" || source?.use === "kitchen" || source?.use === "plant" ? "machinery-hum" : source?.use === "cinema" ? "cinema-bass" : sourceId === "outdoors" ? "traffic-urban" : "speech-raised";
  return { sourceKind: "airborne", sourceId, spectrumId, receiverId: receiver.id, target: receiver.target ? toAnalysisTarget(receiver.target) : null };
}

export function toAnalysisTarget(t: { kind: "nc"; nc: number } | { kind: "dba"; dba: number } | { kind: "reduction"; reductionDb: number }): AnalysisTarget {
  if (t.kind === "nc") return { kind: "nc", nc: Math.min(70, Math.max(10, t.nc)) };
  if (t.kind === "dba") return { kind: "dba", dba: t.dba };
  return { kind: "reduction", reductionDb: t.reductionDb };
}

function Select({ label, value, onChange, children }: { label: string; value: string; onChange: (v: string) => void; children: React.ReactNode }) {
  const id = useId();
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-[13px] font-medium">{label}</label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value)} className="min-h-11 rounded-md border border-rule bg-panel px-2 text-[14px]">{children}</select>
    </div>
  );
}

/** Where the sound starts, what it is, which room must be quiet and how quiet. */
export function AnalysisInputs({ plan, inputs, onChange, plain }: { plan: Plan; inputs: PathInputs; onChange: (next: PathInputs) => void; plain: boolean }) {
  const rooms = elementsOfType(plan, "room");
  const neighbours = elementsOfType(plan, "neighbour");
  const voids = elementsOfType(plan, "void");
  const airborne = sourceLibrary.filter((s) => s.kind === "airborne");
  const sourceValue = inputs.sourceKind === "impact" ? `impact:${inputs.sourceId}` : inputs.sourceId;
  const targetValue = inputs.target ? (inputs.target.kind === "nc" ? `nc:${inputs.target.nc}` : inputs.target.kind === "dba" ? `dba:${inputs.target.dba}` : `reduction:${inputs.target.reductionDb}`) : "none";
  const targets = [15, 20, 25, 30, 35, 40, 45].map((nc) => `nc:${nc}`).concat([25, 30, 35, 40, 45].map((d) => `dba:${d}`));
  if (!targets.includes(targetValue) && targetValue !== "none") targets.unshift(targetValue);
  return (
    <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">
      <Select label={plain ? "Where the noise is" : "Source"} value={sourceValue} onChange={(v) => onChange(v.startsWith("impact:") ? { ...inputs, sourceKind: "impact", sourceId: v.slice(7) } : { ...inputs, sourceKind: "airborne", sourceId: v })}>
        <optgroup label="Airborne">
          {rooms.map((r) => <option key={r.id} value={r.id}>{r.name}</option>)}
          {neighbours.map((n) => <option key={n.id} value={n.id}>{n.name}</option>)}
          {voids.map((v) => <option key={v.id} value={v.id}>{v.name}</option>)}
          <option value="outdoors">Outdoors</option>
        </optgroup>
        <optgroup label="Footfall on a floor">
          {rooms.map((r) => <option key={`i-${r.id}`} value={`impact:${r.id}`}>Footsteps in {r.name}</option>)}
        </optgroup>
      </Select>
      <Select label={plain ? "What the noise is" : "Source spectrum"} value={inputs.sourceKind === "impact" ? "impact-tapping" : inputs.spectrumId} onChange={(v) => onChange({ ...inputs, spectrumId: v })}>
        {inputs.sourceKind === "impact" ? <option value="impact-tapping">Footfall and dropped objects</option> : airborne.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
      </Select>
      <Select label={plain ? "Room that should be quiet" : "Receiver"} value={inputs.receiverId} onChange={(v) => onChange({ ...inputs, receiverId: v })}>
        {rooms.map((r) => <option key={r.id} value={r.id}>{r.name}</option>)}
      </Select>
      <Select label={plain ? "How quiet" : "Target"} value={targetValue} onChange={(v) => {
        if (v === "none") return onChange({ ...inputs, target: null });
        const [kind, n] = v.split(":");
        const value = Number(n);
        onChange({ ...inputs, target: kind === "nc" ? { kind: "nc", nc: value } : kind === "dba" ? { kind: "dba", dba: value } : { kind: "reduction", reductionDb: value } });
      }}>
        <option value="none">No target</option>
        {targets.map((t) => { const [k, n] = t.split(":"); return <option key={t} value={t}>{k === "nc" ? `NC ${n}` : k === "dba" ? `${n} dBA` : `${n} dB quieter`}</option>; })}
      </Select>
    </div>
  );
}
