import type { EditorStore } from "@hushmark/editor-core";
import { setProperties, setWallSetting } from "@hushmark/editor-core";
import { elementsOfType, type FreeWall, type Plan, type WallPiece } from "@hushmark/floorplan";
import { wallPieceById } from "@hushmark/editor-core";
import { formatLength } from "@hushmark/editor-core";
import { ConstructionPicker } from "./construction-picker";
import { CommitInput, SelectField, readNumber } from "./commit-input";

/** The rooms on each side of a wall piece, in words. */
export function pieceTitle(plan: Plan, piece: WallPiece): string {
  const names = piece.sides.map((s) => { const r = plan.elements[s.roomId]; return r?.type === "room" ? r.name : s.roomId; });
  return piece.kind === "shared" ? `Wall between ${names.join(" and ")}` : `Outer wall of ${names[0] ?? "a room"}`;
}

export function findPiece(plan: Plan, id: string): WallPiece | undefined {
  return wallPieceById(plan, id);
}

/** A wall piece derived from room outlines: its construction, thickness, height and what lies beyond it. */
export function WallPieceDetails({ plan, piece, store }: { plan: Plan; piece: WallPiece; store: EditorStore }) {
  const setting = plan.wallSettings[piece.id] ?? {};
  const fallback = piece.kind === "shared" ? plan.defaults.interiorWallConstructionId : plan.defaults.exteriorWallConstructionId;
  const faces = setting.faces ?? plan.defaults.exteriorFaces;
  const neighbours = elementsOfType(plan, "neighbour");
  const thicknessMm = Math.round((setting.thicknessM ?? plan.defaults.wallThicknessM) * 1000);
  return (
    <div className="flex flex-col gap-3">
      <p className="numeric text-sm text-muted">{formatLength(piece.lengthM, plan.displayUnit)} long</p>
      <ConstructionPicker category="wall" value={setting.constructionId ?? fallback} onPick={(id) => store.run(setWallSetting(piece.id, { constructionId: id }))} />
      <CommitInput label="Thickness" suffix="mm" type="number" value={String(thicknessMm)} onCommit={(v) => { const n = readNumber(v); if (n !== null && n > 0) store.run(setWallSetting(piece.id, { thicknessM: n / 1000 })); }} />
      <CommitInput label="Height" suffix="m" type="number" value={setting.heightM !== undefined ? String(setting.heightM) : ""} hint="Empty: the room's ceiling height" onCommit={(v) => { const n = readNumber(v); store.run(setWallSetting(piece.id, { heightM: n !== null && n > 0 ? n : undefined })); }} />
      {piece.kind === "exterior" ? (
        <SelectField
          label="Beyond this wall"
          value={faces.kind === "neighbour" ? `neighbour:${faces.neighbourId}` : faces.kind}
          options={[
            { value: "outdoors", label: "Outdoors" },
            { value: "none", label: "Nothing to analyse" },
            ...neighbours.map((n) => ({ value: `neighbour:${n.id}`, label: n.name })),
          ]}
          onChange={(v) => store.run(setWallSetting(piece.id, { faces: v.startsWith("neighbour:") ? { kind: "neighbour", neighbourId: v.slice(10) } : v === "none" ? { kind: "none" } : { kind: "outdoors" } }))}
        />
      ) : null}
    </div>
  );
}

export function FreeWallDetails({ wall, store, unit }: { wall: FreeWall; store: EditorStore; unit: "metric" | "imperial" }) {
  const set = (patch: Record<string, unknown>, label?: string) => store.run(setProperties(wall.id, patch, label));
  return (
    <div className="flex flex-col gap-3">
      <p className="numeric text-sm text-muted">{formatLength(Math.hypot(wall.end.x - wall.start.x, wall.end.y - wall.start.y), unit)} long</p>
      <ConstructionPicker category="wall" value={wall.constructionId} onPick={(id) => set({ constructionId: id }, "change construction")} />
      <CommitInput label="Thickness" suffix="mm" type="number" value={String(Math.round(wall.thicknessM * 1000))} onCommit={(v) => { const n = readNumber(v); if (n !== null && n > 0) set({ thicknessM: n / 1000 }, "change thickness"); }} />
      <CommitInput label="Height" suffix="m" type="number" value={wall.heightM !== undefined ? String(wall.heightM) : ""} hint="Empty: full storey height" onCommit={(v) => { const n = readNumber(v); set({ heightM: n !== null && n > 0 ? n : undefined }, "change height"); }} />
    </div>
  );
}
