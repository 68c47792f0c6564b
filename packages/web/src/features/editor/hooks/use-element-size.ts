import { useLayoutEffect, useRef, useState } from "react";

/**
 * The content size of an element, kept current with a ResizeObserver. `layoutKey` is something
 * the size depends on that changes in the same commit (a parent's height): it is measured again
 * at once when the key changes, and `key` says which value the size was measured under.
 */
export function useElementSize<T extends HTMLElement>(layoutKey?: unknown) {
  const ref = useRef<T>(null);
  const [size, setSize] = useState<{ width: number; height: number; key: unknown }>({ width: 0, height: 0, key: undefined });
  const keyRef = useRef(layoutKey);
  keyRef.current = layoutKey;
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    const measure = () => {
      const next = { width: Math.floor(el.clientWidth), height: Math.floor(el.clientHeight), key: keyRef.current };
      setSize((s) => (s.width === next.width && s.height === next.height && s.key === next.key ? s : next));
    };
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    return () => ro.disconnect();
  }, [layoutKey]);
  return { ref, ...size };
}

/** A height that fills the window below the element's top (px), at least `min`, so the editor never scrolls the page. */
export function useFillHeight<T extends HTMLElement>(min = 480, bottomGap = 16) {
  const ref = useRef<T>(null);
  const [height, setHeight] = useState(min);
  const [measured, setMeasured] = useState(false);
  useLayoutEffect(() => {
    const measure = () => {
      const el = ref.current;
      if (!el) return;
      const top = el.getBoundingClientRect().top + window.scrollY;
      setHeight(Math.max(min, Math.floor(window.innerHeight - top - bottomGap)));
      setMeasured(true);
    };
    measure();
    window.addEventListener("resize", measure);
    return () => window.removeEventListener("resize", measure);
  }, [min, bottomGap]);
  return { ref, height, measured };
}
