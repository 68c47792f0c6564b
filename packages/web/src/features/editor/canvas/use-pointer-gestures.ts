import { useRef, type PointerEvent as ReactPointerEvent, type WheelEvent as ReactWheelEvent } from "react";
import type { PointerInput, Tool } from "@hushmark/editor-core";
import { panBy, toPlan, zoomAt, type Viewport } from "../model/viewport";

interface Options {
  viewport: Viewport;
  setViewport: (update: (v: Viewport) => Viewport) => void;
  tool: Tool | null;
  /** Called after every event a tool saw, so its overlay redraws. */
  onToolEvent: () => void;
}

/**
 * Pointer, pinch and wheel handling for the canvas. One pointer drives the active tool; a second
 * finger turns it into a pinch (zoom and pan) and cancels what the tool was doing; the middle
 * button or Space pans with any tool.
 */
export function usePointerGestures({ viewport, setViewport, tool, onToolEvent }: Options) {
  const pointers = useRef(new Map<number, { x: number; y: number }>());
  const pinch = useRef<{ dist: number; mid: { x: number; y: number } } | null>(null);
  const panning = useRef<{ x: number; y: number } | null>(null);
  const spaceHeld = useRef(false);
  const vRef = useRef(viewport);
  vRef.current = viewport;

  const local = (e: ReactPointerEvent<HTMLElement> | ReactWheelEvent<HTMLElement>) => {
    const r = e.currentTarget.getBoundingClientRect();
    return { x: e.clientX - r.left, y: e.clientY - r.top };
  };

  const input = (e: ReactPointerEvent<HTMLElement>): PointerInput => {
    const s = local(e);
    return {
      point: toPlan(vRef.current, s.x, s.y),
      shift: e.shiftKey, alt: e.altKey, mod: e.ctrlKey || e.metaKey,
      pointerType: e.pointerType === "pen" || e.pointerType === "touch" ? e.pointerType : "mouse",
    };
  };

  const pinchState = () => {
    const [a, b] = [...pointers.current.values()];
    if (!a || !b) return null;
    return { dist: Math.hypot(a.x - b.x, a.y - b.y), mid: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 } };
  };

  const onPointerDown = (e: ReactPointerEvent<HTMLElement>) => {
    e.currentTarget.focus({ preventScroll: true });
    e.currentTarget.setPointerCapture?.(e.pointerId);
    const s = local(e);
    pointers.current.set(e.pointerId, s);
    if (pointers.current.size === 2) {
      tool?.cancel();
      pinch.current = pinchState();
      onToolEvent();
      return;
    }
    if (e.button === 1 || spaceHeld.current || !tool) {
      panning.current = s;
      return;
    }
    if (e.button !== 0) return;
    tool.down(input(e));
    onToolEvent();
  };

  const onPointerMove = (e: ReactPointerEvent<HTMLElement>) => {
    const s = local(e);
    if (pointers.current.has(e.pointerId)) pointers.current.set(e.pointerId, s);
    if (pinch.current) {
      const next = pinchState();
      if (!next) return;
      const prev = pinch.current;
      pinch.current = next;
      setViewport((v) => zoomAt(panBy(v, next.mid.x - prev.mid.x, next.mid.y - prev.mid.y), next.dist / Math.max(prev.dist, 1), next.mid.x, next.mid.y));
      return;
    }
    if (panning.current) {
      const from = panning.current;
      panning.current = s;
      setViewport((v) => panBy(v, s.x - from.x, s.y - from.y));
      return;
    }
    if (!tool) return;
    tool.move(input(e));
    onToolEvent();
  };

  const onPointerUp = (e: ReactPointerEvent<HTMLElement>) => {
    pointers.current.delete(e.pointerId);
    if (pinch.current) {
      if (pointers.current.size < 2) pinch.current = null;
      return;
    }
    if (panning.current) {
      panning.current = null;
      return;
    }
    if (!tool || e.button > 0) return;
    tool.up(input(e));
    onToolEvent();
  };

  const onPointerCancel = (e: ReactPointerEvent<HTMLElement>) => {
    pointers.current.delete(e.pointerId);
    pinch.current = null;
    panning.current = null;
    tool?.cancel();
    onToolEvent();
  };

  const onWheel = (e: ReactWheelEvent<HTMLElement>) => {
    const s = local(e);
    // Trackpads send small pixel deltas for two-finger scrolls (pan) and ctrl+wheel for pinches (zoom);
    // a mouse wheel sends large steps, which zoom.
    const isPinch = e.ctrlKey;
    const isScroll = !isPinch && e.deltaMode === 0 && (Math.abs(e.deltaX) > 0 || Math.abs(e.deltaY) < 40);
    if (isScroll) setViewport((v) => panBy(v, -e.deltaX, -e.deltaY));
    else setViewport((v) => zoomAt(v, Math.exp(-e.deltaY * (isPinch ? 0.01 : 0.0015)), s.x, s.y));
  };

  return { onPointerDown, onPointerMove, onPointerUp, onPointerCancel, onWheel, spaceHeld };
}
