import { forwardRef, memo, useEffect, useRef, useState } from "react";
import type Konva from "konva";
import { Group, Image as KImage, Layer, Rect, Text } from "react-konva";
import type { Underlay } from "@hushmark/floorplan";
import type { Viewport } from "../model/viewport";
import { danger } from "./colours";

/** Loaded underlay images by URL, kept for the page's life so switching levels or sections does not fetch again. */
const images = new Map<string, HTMLImageElement | "failed">();
const waiting = new Map<string, Set<() => void>>();

function loadImage(src: string, onDone: () => void): HTMLImageElement | "failed" | null {
  const known = images.get(src);
  if (known) return known;
  let subs = waiting.get(src);
  if (!subs) {
    subs = new Set();
    waiting.set(src, subs);
    const img = new window.Image();
    img.decoding = "async";
    const finish = (value: HTMLImageElement | "failed") => {
      images.set(src, value);
      for (const cb of waiting.get(src) ?? []) cb();
      waiting.delete(src);
    };
    img.onload = () => finish(img);
    img.onerror = () => finish("failed");
    img.src = src;
  }
  subs.add(onDone);
  return null;
}

function useImages(srcs: readonly string[]): Map<string, HTMLImageElement | "failed"> {
  const [, setTick] = useState(0);
  const out = new Map<string, HTMLImageElement | "failed">();
  for (const src of srcs) {
    const got = loadImage(src, () => setTick((t) => t + 1));
    if (got) out.set(src, got);
  }
  return out;
}

/** Largest cache bitmap side, px; zoomed in further, the images are drawn directly instead. */
const MAX_CACHE_PX = 4096;

export interface UnderlayLayerProps {
  underlays: readonly Underlay[] | undefined;
  levelId: string;
  /** The drawn view (the compositor moves the layer between redraws). */
  v: Viewport;
  src: ((fileId: string) => string) | undefined;
}

/**
 * Drawings traced over, under everything else on the level. Never listens for events, and the
 * images are cached as one bitmap at the drawn zoom, so a redraw after panning is a single copy
 * and editing the plan above never touches this layer.
 */
export const UnderlayLayer = memo(forwardRef<Konva.Layer, UnderlayLayerProps>(function UnderlayLayer({ underlays, levelId, v, src }, ref) {
  const shown = src ? (underlays ?? []).filter((u) => u.levelId === levelId && u.visible) : [];
  const loaded = useImages(shown.map((u) => src!(u.fileId)));
  const groupRef = useRef<Konva.Group>(null);
  const ready = shown.filter((u) => loaded.has(src!(u.fileId))).length;

  useEffect(() => {
    const g = groupRef.current;
    if (!g) return;
    g.clearCache();
    if (ready === 0) return;
    const pixelRatio = v.scale * (window.devicePixelRatio || 1);
    const box = g.getClientRect({ skipTransform: true });
    if (box.width * pixelRatio <= MAX_CACHE_PX && box.height * pixelRatio <= MAX_CACHE_PX && box.width > 0 && box.height > 0) g.cache({ pixelRatio });
    g.getLayer()?.batchDraw();
  }, [underlays, levelId, v.scale, ready]);

  return (
    <Layer ref={ref} listening={false}>
      <Group x={v.ox} y={v.oy} scaleX={v.scale} scaleY={-v.scale} listening={false}>
        <Group ref={groupRef} listening={false}>
          {shown.map((u) => {
            const img = loaded.get(src!(u.fileId));
            const common = { x: u.origin.x, y: u.origin.y, rotation: u.rotationDeg, scaleX: u.scaleMPerPx, scaleY: -u.scaleMPerPx, width: u.widthPx, height: u.heightPx, listening: false } as const;
            if (img === undefined) return null;
            if (img === "failed") {
              return (
                <Group key={u.id} {...common}>
                  <Rect width={u.widthPx} height={u.heightPx} stroke={danger} strokeWidth={2 / (u.scaleMPerPx * v.scale)} dash={[8 / (u.scaleMPerPx * v.scale), 6 / (u.scaleMPerPx * v.scale)]} listening={false} />
                  <Text text="This drawing could not be loaded" fill={danger} fontSize={14 / (u.scaleMPerPx * v.scale)} x={8 / (u.scaleMPerPx * v.scale)} y={8 / (u.scaleMPerPx * v.scale)} listening={false} />
                </Group>
              );
            }
            return <KImage key={u.id} image={img} opacity={u.opacity} perfectDrawEnabled={false} {...common} />;
          })}
        </Group>
      </Group>
    </Layer>
  );
}));
