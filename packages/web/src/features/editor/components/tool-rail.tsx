import type { ToolId } from "@hushmark/editor-core";
import { ToolIcon } from "./tool-icons";
import { TOOL_GROUPS } from "./tools";

/** The tools down the left edge: 44 px targets, a tooltip with the name, what it does and its key. */
export function ToolRail({ active, onPick, orientation = "vertical" }: { active: ToolId; onPick: (id: ToolId) => void; orientation?: "vertical" | "horizontal" }) {
  const vertical = orientation === "vertical";
  return (
    <div role="toolbar" aria-label="Sketch tools" aria-orientation={orientation} className={`flex ${vertical ? "flex-col overflow-y-auto" : "flex-row overflow-x-auto"} shrink-0 gap-1 border-rule bg-panel p-1 ${vertical ? "border-r" : "border-b"}`}>
      {TOOL_GROUPS.map((group, gi) => (
        <div key={gi} className={`${vertical ? "grid grid-cols-2" : "flex flex-row"} gap-1 ${gi ? (vertical ? "border-t border-rule pt-1" : "border-l border-rule pl-1") : ""}`}>
          {group.map((t) => (
            <button
              key={t.id}
              type="button"
              aria-pressed={active === t.id}
              aria-label={t.name}
              aria-keyshortcuts={t.key}
              onClick={() => onPick(t.id)}
              className={`group relative flex h-11 w-11 shrink-0 items-center justify-center rounded-md ${active === t.id ? "bg-brand text-white" : "text-ink hover:bg-ink/5"}`}
            >
              <ToolIcon id={t.id} />
              <span role="tooltip" className={`pointer-events-none absolute z-20 hidden w-56 rounded-md bg-ink px-3 py-2 text-left text-[13px] leading-snug text-white shadow-lg group-hover:block group-focus-visible:block ${vertical ? "left-12 top-0" : "left-0 top-12"}`}>
                <span className="font-semibold">{t.name}</span> <kbd className="ml-1 rounded bg-white/15 px-1 text-[11px] uppercase">{t.key}</kbd>
                <span className="mt-0.5 block text-white/85">{t.tip}</span>
              </span>
            </button>
          ))}
        </div>
      ))}
    </div>
  );
}
