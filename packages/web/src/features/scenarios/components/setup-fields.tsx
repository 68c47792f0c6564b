import { catalogueResponseSchema, type ScenarioSetup } from "@hushmark/schemas";
import { useQuery } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";

export interface SpaceOption {
  id: string;
  name: string;
  target?: { kind: string; nc?: number; dba?: number; reductionDb?: number } | undefined;
  use?: string | undefined;
}

/** Room uses that are usually where the noise starts (a default only; the planner picks). */
const NOISY_USES = ["cafe", "cinema", "plant", "classroom", "kitchen", "retail"];

/** Rooms, voids, neighbours and the outdoors of a plan document, for the source and receiver pickers. */
export function planSpaces(document: Record<string, unknown>): SpaceOption[] {
  const elements = (document.elements ?? {}) as Record<string, { type?: string; name?: string; use?: string; target?: SpaceOption["target"] }>;
  const spaces = Object.entries(elements)
    .filter(([, e]) => e.type === "room" || e.type === "void" || e.type === "neighbour")
    .map(([id, e]) => ({ id, name: e.name || id, use: e.use, target: e.type === "room" ? e.target : undefined }));
  return [...spaces, { id: "outdoors", name: "Outdoors" }];
}

/** The first sensible setup: the room with a target listens, another room is the source. */
export function defaultSetup(document: Record<string, unknown>, planVersion: number): ScenarioSetup | null {
  const spaces = planSpaces(document);
  const receiver = spaces.find((s) => s.target) ?? spaces[0];
  const others = spaces.filter((s) => s.id !== receiver?.id && s.id !== "outdoors");
  const source = NOISY_USES.map((use) => others.find((s) => s.use === use)).find(Boolean) ?? others[0];
  if (!receiver || !source) return null;
  const t = receiver.target;
  const target = t?.kind === "nc" && t.nc !== undefined ? { kind: "nc" as const, nc: t.nc } : t?.kind === "dba" && t.dba !== undefined ? { kind: "dba" as const, dba: t.dba } : undefined;
  return { planVersion, source: { kind: "airborne", spaceId: source.id, spectrum: { kind: "library", id: "speech-raised" } }, receiverId: receiver.id, ...(target ? { target } : {}) };
}

const selectClasses = "min-h-11 w-full rounded-md border border-rule bg-panel px-3 text-[15px]";

export function SetupFields({ document, setup, onChange }: { document: Record<string, unknown>; setup: ScenarioSetup; onChange: (s: ScenarioSetup) => void }) {
  const spaces = planSpaces(document);
  const catalogue = useQuery({ queryKey: ["catalogue"], queryFn: ({ signal }) => api.get("/catalogue", catalogueResponseSchema, signal), staleTime: 5 * 60_000 });
  const source = setup.source.kind === "airborne" ? setup.source : null;
  const nc = setup.target?.kind === "nc" ? setup.target.nc : "";
  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
      <label className="flex flex-col gap-1 text-sm font-medium">
        Noise starts in
        <select className={selectClasses} value={source?.spaceId ?? ""} onChange={(e) => onChange({ ...setup, source: { kind: "airborne", spaceId: e.target.value, spectrum: source?.spectrum ?? { kind: "library", id: "speech-raised" } } })}>
          {spaces.filter((s) => s.id !== setup.receiverId).map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium">
        Kind of noise
        <select className={selectClasses} value={source?.spectrum.kind === "library" ? source.spectrum.id : ""} onChange={(e) => source && onChange({ ...setup, source: { ...source, spectrum: { kind: "library", id: e.target.value } } })}>
          {(catalogue.data?.sources ?? [{ id: "speech-raised", name: "Raised speech" }]).map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium">
        Quiet room
        <select className={selectClasses} value={setup.receiverId} onChange={(e) => onChange({ ...setup, receiverId: e.target.value })}>
          {spaces.filter((s) => s.id !== source?.spaceId && s.id !== "outdoors").map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium">
        Target (NC)
        <input className={selectClasses} type="number" min={15} max={70} value={nc} placeholder="none" onChange={(e) => {
          const v = e.target.value === "" ? undefined : Number(e.target.value);
          const { target: _t, ...rest } = setup;
          onChange(v === undefined || !Number.isFinite(v) ? rest : { ...rest, target: { kind: "nc", nc: Math.min(70, Math.max(15, v)) } });
        }} />
      </label>
    </div>
  );
}
