import { useSyncExternalStore } from "react";

/** Whether a CSS media query matches now, following changes (rotation, window resizing). */
export function useMediaQuery(query: string): boolean {
  return useSyncExternalStore(
    (cb) => {
      if (typeof window.matchMedia !== "function") return () => {};
      const list = window.matchMedia(query);
      list.addEventListener("change", cb);
      return () => list.removeEventListener("change", cb);
    },
    () => (typeof window.matchMedia === "function" ? window.matchMedia(query).matches : false),
  );
}

/** Phone widths, where the tools run along the top so the plan keeps the full width. */
export const NARROW = "(max-width: 639px)";
