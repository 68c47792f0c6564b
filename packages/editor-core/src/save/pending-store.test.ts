import { describe, expect, it } from "vitest";
import { memoryStorage, pendingAlreadyStored, storagePendingStore } from "./pending-store.js";

describe("the pending store", () => {
  it("keeps one project's unsent plan and survives a new store over the same storage (a reload)", () => {
    const storage = memoryStorage();
    storagePendingStore(storage, "p1").write({ document: { name: "Kept" }, baseVersion: 3, editedAt: 10 });
    expect(storagePendingStore(storage, "p1").read()).toEqual({ document: { name: "Kept" }, baseVersion: 3, editedAt: 10 });
    expect(storagePendingStore(storage, "p2").read()).toBeNull();
    storage.setItem("hushmark.pending-plan.p1", "{not json");
    expect(storagePendingStore(storage, "p1").read()).toBeNull();
  });

  it("tells an edit the server already holds (its answer was lost) from one it does not", () => {
    const pending = { document: { name: "Plan", elements: { a: { x: 1, y: 2 } } }, baseVersion: 4, editedAt: 0 };
    // The same document with its keys in another order, as jsonb gives it back.
    expect(pendingAlreadyStored(pending, { version: 5, document: { elements: { a: { y: 2, x: 1 } }, name: "Plan" } })).toBe(true);
    expect(pendingAlreadyStored(pending, { version: 4, document: pending.document })).toBe(false);
    expect(pendingAlreadyStored(pending, { version: 5, document: { name: "Plan", elements: { a: { x: 1, y: 3 } } } })).toBe(false);
    expect(pendingAlreadyStored(pending, { version: 6, document: { name: "Someone else's plan" } })).toBe(false);
  });
});
