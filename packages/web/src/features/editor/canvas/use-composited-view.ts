import { useEffect, useRef, useState, type RefObject } from "react";
import type Konva from "konva";
import type { Viewport } from "../model/viewport";

/** How long the view must rest before the heavy layers are redrawn crisp at the new pan and zoom, ms. */
const SETTLE_MS = 140;

/**
 * Pans and zooms the heavy layers (grid, elements, overlay) by moving their canvases with a CSS
 * transform while the view is changing, and redraws them with Konva only once it rests. The live
 * view still drives hit-testing and the UI layer, so pointing stays exact throughout.
 */
export function useCompositedView(v: Viewport, layers: Array<RefObject<Konva.Layer | null>>): Viewport {
  const [drawn, setDrawn] = useState(v);
  const timer = useRef<number | null>(null);
  useEffect(() => {
    const same = drawn.scale === v.scale && drawn.ox === v.ox && drawn.oy === v.oy;
    const k = v.scale / drawn.scale;
    const transform = same ? "" : `translate(${v.ox - drawn.ox * k}px, ${v.oy - drawn.oy * k}px) scale(${k})`;
    for (const ref of layers) {
      const canvas = ref.current?.getNativeCanvasElement();
      if (!canvas) continue;
      canvas.style.transformOrigin = "0 0";
      canvas.style.transform = transform;
    }
    if (same) return;
    if (timer.current !== null) window.clearTimeout(timer.current);
    timer.current = window.setTimeout(() => {
      timer.current = null;
      setDrawn(v);
    }, SETTLE_MS);
  });
  useEffect(() => () => { if (timer.current !== null) window.clearTimeout(timer.current); }, []);
  return drawn;
}
