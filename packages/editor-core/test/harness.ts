import type { Plan, Point } from "@hushmark/floorplan";
import { EditorStore } from "../src/store/store.js";
import { newPlan } from "../src/commands/new-plan.js";
import { createTool } from "../src/tools/create-tool.js";
import type { PointerInput, Tool, ToolEnv, ToolId } from "../src/tools/tool.js";

/**
 * Drives tools the way the canvas does: pointer events in plan metres, keys by name. Pointer
 * sequences interpolate a few moves between points, as a real drag delivers them.
 */
export class ToolHarness {
  readonly store: EditorStore;
  readonly env: ToolEnv;
  tool: Tool;
  panned: Point = { x: 0, y: 0 };
  doneCount = 0;

  constructor(plan: Plan = newPlan("test-plan", "Test"), toolId: ToolId = "select", env: Partial<ToolEnv> = {}) {
    this.store = new EditorStore(plan);
    this.env = {
      store: this.store, levelId: "ground", unit: "metric", gridM: 0.1, toleranceM: 0.15,
      pan: (d) => { this.panned = { x: this.panned.x + d.x, y: this.panned.y + d.y }; },
      done: () => { this.doneCount++; },
      ...env,
    };
    this.tool = createTool(toolId, this.env);
  }

  use(id: ToolId): this {
    this.tool.cancel();
    this.tool = createTool(id, this.env);
    return this;
  }

  get plan(): Plan {
    return this.store.plan;
  }

  private input(p: Point, extra: Partial<PointerInput>): PointerInput {
    return { point: p, pointerType: "mouse", ...extra };
  }

  hover(x: number, y: number, extra: Partial<PointerInput> = {}): this {
    this.tool.move(this.input({ x, y }, extra));
    return this;
  }

  click(x: number, y: number, extra: Partial<PointerInput> = {}): this {
    const p = { x, y };
    this.tool.move(this.input(p, extra));
    this.tool.down(this.input(p, extra));
    this.tool.up(this.input(p, extra));
    return this;
  }

  /** Down at the first point, moves through the rest (with steps in between), up at the last. */
  drag(points: Array<[number, number]>, extra: Partial<PointerInput> = {}, options: { release?: boolean } = {}): this {
    const [first, ...rest] = points;
    if (!first) return this;
    let prev = { x: first[0], y: first[1] };
    this.tool.move(this.input(prev, extra));
    this.tool.down(this.input(prev, extra));
    for (const [x, y] of rest) {
      for (let i = 1; i <= 4; i++) {
        const p = { x: prev.x + ((x - prev.x) * i) / 4, y: prev.y + ((y - prev.y) * i) / 4 };
        this.tool.move(this.input(p, extra));
      }
      prev = { x, y };
    }
    if (options.release !== false) this.tool.up(this.input(prev, extra));
    return this;
  }

  press(key: string, extra: { shift?: boolean; mod?: boolean } = {}): boolean {
    return this.tool.key({ key, ...extra });
  }

  type(text: string): this {
    for (const ch of text) this.tool.key({ key: ch });
    return this;
  }

  elementsOf(type: string) {
    return Object.values(this.plan.elements).filter((e) => e.type === type);
  }
}

/** A fake clock whose timers run only when the test advances time. */
export class FakeClock {
  private t = 0;
  private timers = new Map<number, { at: number; fn: () => void }>();
  private nextId = 1;

  now(): number { return this.t; }

  setTimeout(fn: () => void, ms: number): unknown {
    const id = this.nextId++;
    this.timers.set(id, { at: this.t + ms, fn });
    return id;
  }

  clearTimeout(handle: unknown): void {
    this.timers.delete(handle as number);
  }

  /** Moves time forward, running due timers in order and letting promises settle between them. */
  async advance(ms: number): Promise<void> {
    const end = this.t + ms;
    for (;;) {
      await flush();
      const due = [...this.timers.entries()].filter(([, v]) => v.at <= end).sort((a, b) => a[1].at - b[1].at)[0];
      if (!due) break;
      this.timers.delete(due[0]);
      this.t = Math.max(this.t, due[1].at);
      due[1].fn();
    }
    this.t = end;
    await flush();
  }

  get pending(): number { return this.timers.size; }
}

async function flush(): Promise<void> {
  for (let i = 0; i < 5; i++) await Promise.resolve();
}
