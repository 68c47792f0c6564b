import type { DxfReportLine } from "./dxf-import-types.js";

/** Collects report lines keyed by reason, keeping counts, entity types and a few handles. */
export class ReportLines {
  private readonly byReason = new Map<string, { count: number; types: Set<string>; handles: string[] }>();

  /** Records `count` entities for `reason` (no unit). */
  add(reason: string, type: string, handles: readonly string[], count = 1): void {
    const line = this.byReason.get(reason) ?? { count: 0, types: new Set<string>(), handles: [] };
    line.count += count;
    line.types.add(type);
    for (const h of handles) if (line.handles.length < 5 && h) line.handles.push(h);
    this.byReason.set(reason, line);
  }

  /** The lines, most frequent first (no unit). */
  lines(): DxfReportLine[] {
    return [...this.byReason.entries()]
      .map(([reason, l]) => ({ reason, count: l.count, types: [...l.types].sort(), handles: l.handles }))
      .sort((a, b) => b.count - a.count || (a.reason < b.reason ? -1 : 1));
  }
}
