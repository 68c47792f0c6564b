/** Public API of @hushmark/editor-core: the plan editor's document store, commands, tools, snapping and saving, with no UI. */

export { EditorStore } from "./store/store.js";
export type { ChangeKind, StoreListener } from "./store/store.js";
export { command } from "./store/command.js";
export type { Command } from "./store/command.js";
export type { HistoryEntry } from "./store/history.js";
export { IdSource } from "./store/ids.js";

export { newPlan } from "./commands/new-plan.js";
export { addRoomRectangle, addRoomPolygon, moveVertex, splitEdge, deleteVertex } from "./commands/rooms.js";
export type { NewRoom } from "./commands/rooms.js";
export { addWall, moveWallEnd } from "./commands/walls.js";
export { addOpening, placeOpening, setLeaks, openingSpot, OPENING_DEFAULTS } from "./commands/openings.js";
export type { OpeningKind } from "./commands/openings.js";
export { addPin, addNote, addVent, addDuct, addVoid } from "./commands/marks.js";
export { moveElements, deleteElements, dependents, setProperties, setWallSetting, setPlanUnit, addLevel, renameElement } from "./commands/edit.js";
export { copyElements, pasteClip } from "./commands/clipboard.js";
export { addUnderlay, setUnderlayPlacement, setUnderlayLook, removeUnderlay } from "./commands/underlays.js";
export type { NewUnderlay } from "./commands/underlays.js";
export {
  underlayPixelToPlan, underlayPlanToPixel, underlayCorners, calibrateUnderlay, calibrateUnderlayTyped, rotateUnderlayAbout, squaringTurnDeg, normalDeg,
} from "./underlays/placement.js";
export type { UnderlayPlacement, CalibrationResult } from "./underlays/placement.js";
export type { Clip } from "./commands/clipboard.js";

export { snapPoint, snapToGrid } from "./geometry/snap.js";
export type { SnapKind, SnapOptions, SnapResult } from "./geometry/snap.js";
export { hitTest, hitTestAll, roomAt } from "./geometry/hit-test.js";
export type { Hit } from "./geometry/hit-test.js";
export { elementBounds, planBounds, boundsOfMany, unionBounds } from "./geometry/bounds.js";
export type { Bounds } from "./geometry/bounds.js";
export { wallHosts, hostOf, levelOf } from "./geometry/hosts.js";
export { wallPiecesOf, wallPieceById } from "./geometry/pieces.js";
export type { WallHost } from "./geometry/hosts.js";

export { parseLength, parseLengthPair, formatLength, isLengthKey } from "./units/length.js";
export type { DisplayUnit } from "./units/length.js";

export { createTool } from "./tools/create-tool.js";
export type { Tool, ToolEnv, ToolId, ToolOverlay, PointerInput, KeyInput } from "./tools/tool.js";
export { selectionFor } from "./tools/select/select-target.js";
export { InspectTool } from "./tools/inspect/inspect-tool.js";

export { Autosave } from "./save/autosave.js";
export type { AutosaveOptions } from "./save/autosave.js";
export { storagePendingStore, memoryStorage, pendingAlreadyStored } from "./save/pending-store.js";
export type { KeyValueStorage } from "./save/pending-store.js";
export type { Clock, PendingSave, PendingStore, SaveOutcome, SaveStatus, SaveTransport } from "./save/types.js";
