import type { KeyboardEvent } from "react";
import { copyElements, deleteElements, pasteClip, type Clip, type EditorStore, type Tool, type ToolId } from "@hushmark/editor-core";
import { panBy, zoomAt, type Viewport } from "../model/viewport";
import { ALL_TOOLS } from "../components/tools";

interface Keys {
  store: EditorStore;
  tool: Tool | null;
  levelId: string;
  setTool: (id: ToolId) => void;
  setViewport: (update: (v: Viewport) => Viewport) => void;
  fit: () => void;
  size: { width: number; height: number };
  clipboard: { current: Clip | null };
  readOnly: boolean;
}

/** The canvas's keyboard: the tool first (typed lengths, Escape), then undo/redo, clipboard, delete, zoom, pan and tool keys. */
export function editorKeyHandler(k: Keys) {
  return (e: KeyboardEvent<HTMLDivElement>) => {
    const mod = e.ctrlKey || e.metaKey;
    if (k.tool && k.tool.key({ key: e.key, shift: e.shiftKey, mod })) { e.preventDefault(); return; }
    const { store } = k;
    const key = e.key.toLowerCase();
    const zoom = (f: number) => k.setViewport((v) => zoomAt(v, f, k.size.width / 2, k.size.height / 2));
    if (!k.readOnly && mod && key === "z") { e.preventDefault(); if (e.shiftKey) store.redo(); else store.undo(); return; }
    if (!k.readOnly && mod && key === "y") { e.preventDefault(); store.redo(); return; }
    if (mod && key === "c") { k.clipboard.current = copyElements(store.plan, store.selection.filter((id) => id in store.plan.elements)); e.preventDefault(); return; }
    if (!k.readOnly && mod && key === "v" && k.clipboard.current) {
      const { cmd, newIds } = pasteClip(k.clipboard.current, { x: 0.5, y: -0.5 }, k.levelId, store.ids);
      if (store.run(cmd)) store.select(newIds.filter((id) => store.plan.elements[id]?.type !== "door" && store.plan.elements[id]?.type !== "window"));
      e.preventDefault();
      return;
    }
    if (mod && key === "a") { e.preventDefault(); store.select(Object.values(store.plan.elements).filter((el) => "levelId" in el && el.levelId === k.levelId).map((el) => el.id)); return; }
    if (!k.readOnly && (e.key === "Delete" || e.key === "Backspace") && store.selection.length) {
      e.preventDefault();
      store.run(deleteElements(store.selection.filter((id) => id in store.plan.elements), store.plan));
      return;
    }
    if (e.key === "Escape") { k.tool?.cancel(); store.select([]); return; }
    if (e.key === "+" || e.key === "=") { zoom(1.25); return; }
    if (e.key === "-" || e.key === "_") { zoom(0.8); return; }
    if (e.key === "0" || (key === "f" && !mod)) { k.fit(); return; }
    const step = e.shiftKey ? 200 : 60;
    if (e.key === "ArrowLeft") { e.preventDefault(); k.setViewport((v) => panBy(v, step, 0)); return; }
    if (e.key === "ArrowRight") { e.preventDefault(); k.setViewport((v) => panBy(v, -step, 0)); return; }
    if (e.key === "ArrowUp") { e.preventDefault(); k.setViewport((v) => panBy(v, 0, step)); return; }
    if (e.key === "ArrowDown") { e.preventDefault(); k.setViewport((v) => panBy(v, 0, -step)); return; }
    if (!mod && !k.readOnly) {
      const t = ALL_TOOLS.find((x) => x.key === key);
      if (t) k.setTool(t.id);
    }
  };
}
