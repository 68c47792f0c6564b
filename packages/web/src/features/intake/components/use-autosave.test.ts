import { act, renderHook, waitFor } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ApiError } from "../../../lib/api-client";
import { saveStateText, useAutosave } from "./use-autosave";

const tick = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe("useAutosave", () => {
  it("saves once after a burst of changes, and saves again with the answered version when a change lands mid-save", async () => {
    const calls: { value: number; base: number }[] = [];
    let current = 1;
    let release: (() => void) | null = null;
    const { result } = renderHook(() =>
      useAutosave<number>({
        version: 4,
        delayMs: 10,
        validate: async () => current,
        save: async (value, base) => {
          calls.push({ value, base });
          if (calls.length === 1) await new Promise<void>((r) => (release = r));
          return base + 1;
        },
      }),
    );
    act(() => {
      result.current.changed();
      result.current.changed();
      result.current.changed();
    });
    expect(result.current.state.kind).toBe("pending");
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(result.current.state.kind).toBe("saving");
    current = 2;
    act(() => result.current.changed());
    await tick(30);
    expect(calls).toHaveLength(1);
    await act(async () => release!());
    await waitFor(() => expect(result.current.state.kind).toBe("saved"));
    expect(calls).toEqual([{ value: 1, base: 4 }, { value: 2, base: 5 }]);
    expect(saveStateText(result.current.state)).toMatch(/^All changes saved at/);
  });

  it("saves a waiting change when the screen closes", async () => {
    const saved: string[] = [];
    const { result, unmount } = renderHook(() => useAutosave<string>({ version: 2, delayMs: 60_000, validate: async () => "last words", save: async (v, base) => (saved.push(`${v}@${base}`), base + 1) }));
    act(() => result.current.changed());
    unmount();
    await waitFor(() => expect(saved).toEqual(["last words@2"]));
  });

  it("does not send an invalid form, and stops on a conflict", async () => {
    let valid = false;
    let calls = 0;
    const { result } = renderHook(() =>
      useAutosave<string>({
        version: 0,
        delayMs: 5,
        validate: async () => (valid ? "brief" : null),
        save: async () => {
          calls += 1;
          throw new ApiError({ status: 409, code: "version_conflict", message: "changed elsewhere" });
        },
      }),
    );
    act(() => result.current.changed());
    await waitFor(() => expect(result.current.state.kind).toBe("invalid"));
    expect(calls).toBe(0);
    valid = true;
    act(() => result.current.changed());
    await waitFor(() => expect(result.current.state.kind).toBe("conflict"));
    expect(calls).toBe(1);
    act(() => result.current.changed());
    expect(result.current.state.kind).toBe("conflict");
    expect(saveStateText(result.current.state)).toMatch(/reload/);
  });
});
