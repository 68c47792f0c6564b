import type { Patch } from "immer";

/** One undoable step: the patches that made it and the inverse patches that take it back. */
export interface HistoryEntry {
  name: string;
  label: string;
  patches: Patch[];
  inversePatches: Patch[];
}

/** Undo and redo stacks with a cap on the number of steps kept. */
export class History {
  private past: HistoryEntry[] = [];
  private future: HistoryEntry[] = [];

  constructor(private readonly limit = 500) {}

  push(entry: HistoryEntry): void {
    this.past.push(entry);
    if (this.past.length > this.limit) this.past.shift();
    this.future = [];
  }

  takeUndo(): HistoryEntry | undefined {
    const entry = this.past.pop();
    if (entry) this.future.push(entry);
    return entry;
  }

  takeRedo(): HistoryEntry | undefined {
    const entry = this.future.pop();
    if (entry) this.past.push(entry);
    return entry;
  }

  clear(): void {
    this.past = [];
    this.future = [];
  }

  get undoLabel(): string | null {
    return this.past.at(-1)?.label ?? null;
  }

  get redoLabel(): string | null {
    return this.future.at(-1)?.label ?? null;
  }

  get size(): { past: number; future: number } {
    return { past: this.past.length, future: this.future.length };
  }
}
