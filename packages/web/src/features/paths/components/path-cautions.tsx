import type { Plan } from "@hushmark/floorplan";
import type { AnalysisResult } from "@hushmark/schemas";
import { cautionsFor, CAUTIONS, type Caution } from "../../editor/panels/cautions";

/** The safety cautions that apply to the elements carrying the sound, each deferring to local codes and professionals. */
export function PathCautions({ plan, result }: { plan: Plan; result: AnalysisResult }) {
  const seen = new Map<string, Caution>();
  for (const e of result.elements.slice(0, 8)) for (const c of cautionsFor(plan, e.elementId)) seen.set(c.id, c);
  if (result.elements.some((e) => e.kind === "floor" || e.kind === "ceiling")) seen.set(CAUTIONS.structural.id, CAUTIONS.structural);
  const list = [...seen.values()];
  if (!list.length) return null;
  return (
    <section aria-labelledby="cautions-title">
      <h3 id="cautions-title" className="text-[15px] font-semibold">Before anything is changed</h3>
      <ul className="mt-1 flex flex-col gap-1.5">
        {list.map((c) => <li key={c.id} className="rounded-md bg-caution/10 px-3 py-2 text-[13px]"><span className="font-semibold">{c.title}.</span> {c.text}</li>)}
      </ul>
      <p className="mt-1 text-[12px] text-muted">These are general cautions; local codes and licensed professionals have the last word.</p>
    </section>
  );
}
