import { applyPatches, enablePatches, freeze, produce, produceWithPatches } from "immer";
import type { Plan } from "@hushmark/floorplan";
import type { Command } from "./command.js";
import { History, type HistoryEntry } from "./history.js";
import { IdSource } from "./ids.js";

enablePatches();

/**
 * A plan from outside (parsed from the server or storage) frozen deeply, as every plan immer
 * produces already is: the plan model indexes frozen element records once instead of scanning
 * them on every lookup, which on a large plan is most of the cost of drawing it the first time.
 */
const frozen = (plan: Plan): Plan => freeze(plan, true);

export type StoreListener = (store: EditorStore) => void;

/** Why the plan last changed: an edit (worth saving), an undo/redo, a drag preview, or a load. */
export type ChangeKind = "edit" | "undo" | "redo" | "preview" | "rollback" | "load" | "selection";

interface Transaction {
  base: Plan;
  last: Command | null;
}

/**
 * The document store: the plan as an immutable value, edited only through named commands.
 * History keeps immer patches; selection and loads from the server stay out of it. A drag
 * previews each move from the plan at pointer-down and records one entry on release.
 */
export class EditorStore {
  private current: Plan;
  private selected: readonly string[] = [];
  private readonly history: History;
  private tx: Transaction | null = null;
  private listeners = new Set<StoreListener>();
  /** Counts changes that should reach the server (edits, undo, redo), so autosave can tell. */
  private editCount = 0;
  lastChange: ChangeKind = "load";
  readonly ids: IdSource;

  constructor(plan: Plan, options: { historyLimit?: number } = {}) {
    this.current = frozen(plan);
    this.history = new History(options.historyLimit);
    this.ids = new IdSource(() => this.current);
  }

  get plan(): Plan {
    return this.current;
  }

  get selection(): readonly string[] {
    return this.selected;
  }

  get edits(): number {
    return this.editCount;
  }

  /** The plan as it was when the current drag began, or null outside a drag. */
  get transactionBase(): Plan | null {
    return this.tx?.base ?? null;
  }

  get inTransaction(): boolean {
    return this.tx !== null;
  }

  get undoLabel(): string | null {
    return this.history.undoLabel;
  }

  get redoLabel(): string | null {
    return this.history.redoLabel;
  }

  get historySize(): { past: number; future: number } {
    return this.history.size;
  }

  subscribe(listener: StoreListener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** Runs a command and records it; answers the history entry, or null when it changed nothing. */
  run(cmd: Command): HistoryEntry | null {
    if (this.tx) this.rollback();
    const [next, patches, inversePatches] = produceWithPatches(this.current, cmd.recipe);
    if (patches.length === 0) return null;
    const entry: HistoryEntry = { name: cmd.name, label: cmd.label, patches, inversePatches };
    this.history.push(entry);
    this.current = next;
    this.editCount++;
    this.pruneSelection();
    this.emit("edit");
    return entry;
  }

  /** Starts a drag: later previews are computed from the plan as it is now. */
  begin(): void {
    if (this.tx) return;
    this.tx = { base: this.current, last: null };
  }

  /** Shows a command's result without recording it; each preview replaces the last one. */
  preview(cmd: Command): void {
    if (!this.tx) this.begin();
    const tx = this.tx!;
    tx.last = cmd;
    this.current = produce(tx.base, cmd.recipe);
    this.emit("preview");
  }

  /** Records the last preview as one history entry. */
  commit(): HistoryEntry | null {
    const tx = this.tx;
    if (!tx) return null;
    this.tx = null;
    this.current = tx.base;
    if (!tx.last) return null;
    return this.run(tx.last);
  }

  /** Puts the plan back as it was at `begin()` (Escape during a drag). */
  rollback(): void {
    const tx = this.tx;
    if (!tx) return;
    this.tx = null;
    this.current = tx.base;
    this.emit("rollback");
  }

  undo(): boolean {
    if (this.tx) this.rollback();
    const entry = this.history.takeUndo();
    if (!entry) return false;
    this.current = applyPatches(this.current, entry.inversePatches);
    this.editCount++;
    this.pruneSelection();
    this.emit("undo");
    return true;
  }

  redo(): boolean {
    if (this.tx) this.rollback();
    const entry = this.history.takeRedo();
    if (!entry) return false;
    this.current = applyPatches(this.current, entry.patches);
    this.editCount++;
    this.pruneSelection();
    this.emit("redo");
    return true;
  }

  /** Replaces the plan with one from the server; not an edit, and the old history no longer applies. */
  load(plan: Plan, options: { keepHistory?: boolean } = {}): void {
    this.tx = null;
    this.current = frozen(plan);
    if (!options.keepHistory) this.history.clear();
    this.pruneSelection();
    this.emit("load");
  }

  select(ids: readonly string[]): void {
    const unique = [...new Set(ids)].filter((id) => id in this.current.elements || id.includes("|"));
    if (unique.length === this.selected.length && unique.every((id, i) => id === this.selected[i])) return;
    this.selected = unique;
    this.emit("selection");
  }

  toggleSelected(id: string): void {
    this.select(this.selected.includes(id) ? this.selected.filter((s) => s !== id) : [...this.selected, id]);
  }

  private pruneSelection(): void {
    // Wall-piece ids (`a|b`) are derived, so they survive as long as the plan still makes them.
    const kept = this.selected.filter((id) => id in this.current.elements || id.includes("|"));
    if (kept.length !== this.selected.length) this.selected = kept;
  }

  private emit(kind: ChangeKind): void {
    this.lastChange = kind;
    for (const listener of this.listeners) listener(this);
  }
}
