import type { ToolId } from "@hushmark/editor-core";

const common = { fill: "none", stroke: "currentColor", strokeWidth: 1.8, strokeLinecap: "round" as const, strokeLinejoin: "round" as const };

/** Small line drawings of our own for each tool, 24 × 24. */
const paths: Record<ToolId, React.ReactNode> = {
  select: <path d="M6 4l12 7-5.5 1.5L16 19l-2.5 1.2-3.4-6.4L6 17z" {...common} />,
  "room-rectangle": <><rect x="4" y="6" width="16" height="12" {...common} strokeWidth={2.6} /></>,
  "room-polygon": <path d="M4 18V6h9v5h7v7z" {...common} strokeWidth={2.6} />,
  corners: <><path d="M5 18V6h14v12z" {...common} /><rect x="3" y="4" width="4" height="4" fill="currentColor" /><rect x="17" y="16" width="4" height="4" fill="currentColor" /></>,
  wall: <path d="M4 16L20 8" {...common} strokeWidth={4} />,
  door: <><path d="M3 19h5M16 19h5" {...common} strokeWidth={3} /><path d="M8 19V8" {...common} /><path d="M8 8a11 11 0 0 1 8 11" {...common} strokeDasharray="2 2" /></>,
  window: <><path d="M3 12h3M18 12h3" {...common} strokeWidth={4} /><path d="M6 9.5h12M6 12h12M6 14.5h12" {...common} strokeWidth={1.4} /></>,
  gap: <><path d="M3 12h7M14 12h7" {...common} strokeWidth={4} /><path d="M12 5v3M12 16v3M9 7l1 2M15 7l-1 2" {...common} /></>,
  vent: <><rect x="6" y="6" width="12" height="12" {...common} /><path d="M6 6l12 12" {...common} /></>,
  "duct-link": <><rect x="3" y="3" width="6" height="6" {...common} /><rect x="15" y="15" width="6" height="6" {...common} /><path d="M9 9l6 6" {...common} strokeDasharray="2.5 2" /></>,
  void: <><rect x="4" y="6" width="16" height="12" {...common} strokeDasharray="3 2" /><path d="M8 18l8-12M4 14l5.5-8M12 18l8-11" {...common} strokeWidth={1} /></>,
  pin: <><circle cx="12" cy="11" r="5" {...common} strokeWidth={2.2} /><circle cx="12" cy="11" r="1.4" fill="currentColor" /><path d="M12 16v4" {...common} /></>,
  note: <><path d="M5 5h14v10l-4 4H5z" {...common} /><path d="M15 19v-4h4M8 9h8M8 12h5" {...common} /></>,
  tape: <><rect x="3" y="9" width="18" height="6" rx="1" {...common} /><path d="M7 9v3M11 9v2M15 9v3M19 9v2" {...common} /></>,
  pan: <path d="M12 3v18M3 12h18M12 3l-2.5 2.5M12 3l2.5 2.5M12 21l-2.5-2.5M12 21l2.5-2.5M3 12l2.5-2.5M3 12l2.5 2.5M21 12l-2.5-2.5M21 12l-2.5 2.5" {...common} />,
};

export function ToolIcon({ id }: { id: ToolId }) {
  return (
    <svg viewBox="0 0 24 24" width="22" height="22" aria-hidden="true" focusable="false">
      {paths[id]}
    </svg>
  );
}
