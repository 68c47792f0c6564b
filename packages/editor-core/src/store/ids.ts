import type { Plan } from "@hushmark/floorplan";

/**
 * Fresh element ids like `room-3`: a per-kind counter that skips ids the plan already uses, so
 * ids are deterministic in tests and never collide with loaded or pasted elements.
 */
export class IdSource {
  private counters = new Map<string, number>();

  constructor(private readonly plan: () => Plan) {}

  next(kind: string, taken: ReadonlySet<string> = new Set()): string {
    let n = this.counters.get(kind) ?? 0;
    const elements = this.plan().elements;
    let id: string;
    do {
      n++;
      id = `${kind}-${n}`;
    } while (id in elements || taken.has(id));
    this.counters.set(kind, n);
    return id;
  }
}
