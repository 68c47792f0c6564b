import type { Plan, Problem } from "@hushmark/floorplan";
import { elementTitle } from "../panels/element-title";

/** The plan's problems; choosing one selects its element on the canvas. */
export function ProblemsList({ plan, problems, onPick }: { plan: Plan; problems: readonly Problem[]; onPick: (elementId: string) => void }) {
  if (problems.length === 0) return <p className="p-3 text-sm text-good">No problems: the plan can be analysed.</p>;
  return (
    <ul className="flex flex-col gap-1 p-2" aria-label="Plan problems">
      {problems.map((p, i) => (
        <li key={`${p.code}-${p.elementId}-${i}`}>
          <button
            type="button"
            onClick={() => p.elementId && onPick(p.elementId)}
            className={`flex w-full flex-col items-start rounded-md border-l-4 px-3 py-2 text-left text-sm hover:bg-ink/5 ${p.severity === "error" ? "border-danger" : "border-caution"}`}
          >
            <span className="font-medium">{p.message}</span>
            <span className="text-[13px] text-muted">{p.elementId ? `${elementTitle(plan, p.elementId)} · ` : ""}{p.suggestion}</span>
          </button>
        </li>
      ))}
    </ul>
  );
}
