import type { EditorStore } from "@hushmark/editor-core";
import { copyElements, deleteElements, levelOf, pasteClip } from "@hushmark/editor-core";
import type { Plan, Problem } from "@hushmark/floorplan";
import { Button } from "../../../components/ui/button";
import { RoomDetails } from "./room-details";
import { FreeWallDetails, WallPieceDetails, findPiece, pieceTitle } from "./wall-details";
import { GapDetails, LeafDetails } from "./opening-details";
import { DuctDetails, NoteDetails, PinDetails, VentDetails, VoidDetails } from "./other-details";
import { cautionsFor } from "./cautions";
import { elementTitle } from "./element-title";
import type { PinReading } from "../model/pin-readings";

function Body({ plan, id, store, pins }: { plan: Plan; id: string; store: EditorStore; pins?: PinContext | undefined }) {
  const el = plan.elements[id];
  const unit = plan.displayUnit;
  if (!el) {
    const piece = findPiece(plan, id);
    return piece ? <WallPieceDetails plan={plan} piece={piece} store={store} /> : <p className="text-sm text-muted">This wall no longer exists.</p>;
  }
  switch (el.type) {
    case "room": return <RoomDetails room={el} store={store} unit={unit} />;
    case "wall": return <FreeWallDetails wall={el} store={store} unit={unit} />;
    case "door": case "window": return <LeafDetails el={el} store={store} />;
    case "penetration": return <GapDetails el={el} store={store} />;
    case "vent": return <VentDetails el={el} store={store} />;
    case "duct": return <DuctDetails el={el} store={store} />;
    case "void": return <VoidDetails el={el} store={store} />;
    case "pin": return <PinDetails el={el} store={store} reading={pins?.readings.get(el.id)} projectId={pins?.projectId} />;
    case "note": return <NoteDetails el={el} store={store} />;
    default: return null;
  }
}

/** Copies and pastes beside the original: the touch route to copy and paste. */
function duplicate(store: EditorStore, plan: Plan, ids: readonly string[]): void {
  const own = ids.filter((id) => id in plan.elements);
  const levelId = own.map((id) => levelOf(plan, id)).find(Boolean);
  if (!own.length || !levelId) return;
  const { cmd, newIds } = pasteClip(copyElements(plan, own), { x: 0.5, y: -0.5 }, levelId, store.ids);
  if (store.run(cmd)) store.select(newIds.filter((id) => own.some((o) => plan.elements[o]?.type === store.plan.elements[id]?.type)));
}

/** What a selected pin shows besides its label: its latest reading and the project it links into. */
export interface PinContext { projectId: string; readings: ReadonlyMap<string, PinReading> }

/** The right-hand panel: details of the selection, its problems and the cautions that apply. */
export function DetailsPanel({ plan, selection, store, problems, pins }: { plan: Plan; selection: readonly string[]; store: EditorStore; problems: readonly Problem[]; pins?: PinContext }) {
  if (selection.length === 0) {
    return (
      <div className="p-4 text-[15px]">
        <h2 className="text-base font-semibold">Nothing selected</h2>
        <p className="mt-1 text-sm text-muted">Pick a tool on the left and draw, or select something on the plan or in the list of elements to see and change its details.</p>
      </div>
    );
  }
  if (selection.length > 1) {
    const deletable = selection.filter((id) => id in plan.elements);
    return (
      <div className="flex flex-col gap-3 p-4">
        <h2 className="text-base font-semibold">{selection.length} items selected</h2>
        <ul className="text-sm text-muted">{selection.slice(0, 8).map((id) => <li key={id}>{elementTitle(plan, id)}</li>)}</ul>
        <div className="flex gap-2">
          <Button variant="secondary" disabled={!deletable.length} onClick={() => duplicate(store, plan, deletable)}>Duplicate</Button>
          <Button variant="danger" disabled={!deletable.length} onClick={() => store.run(deleteElements(deletable, plan))}>Delete {deletable.length}</Button>
        </div>
      </div>
    );
  }
  const id = selection[0]!;
  const piece = plan.elements[id] ? null : findPiece(plan, id);
  const title = piece ? pieceTitle(plan, piece) : elementTitle(plan, id);
  const own = problems.filter((p) => p.elementId === id);
  const cautions = cautionsFor(plan, id);
  return (
    <div className="flex flex-col gap-4 p-4" key={id}>
      <div className="flex items-start justify-between gap-2">
        <h2 className="text-base font-semibold leading-tight">{title}</h2>
        {!piece ? (
          <div className="-mr-2 -mt-2 flex">
            <Button variant="ghost" onClick={() => duplicate(store, plan, [id])} aria-label={`Duplicate ${title}`}>Duplicate</Button>
            <Button variant="ghost" className="text-danger" onClick={() => store.run(deleteElements([id], plan))} aria-label={`Delete ${title}`}>Delete</Button>
          </div>
        ) : null}
      </div>
      {own.length ? (
        <ul className="flex flex-col gap-2" aria-label="Problems with this element">
          {own.map((p, i) => (
            <li key={i} className={`rounded-md border-l-4 px-3 py-2 text-sm ${p.severity === "error" ? "border-danger bg-danger/5" : "border-caution bg-caution/10"}`}>
              <p className="font-medium">{p.message}</p>
              {p.suggestion ? <p className="text-muted">{p.suggestion}</p> : null}
            </li>
          ))}
        </ul>
      ) : null}
      <Body plan={plan} id={id} store={store} pins={pins} />
      {cautions.length ? (
        <div className="flex flex-col gap-2" aria-label="Cautions">
          {cautions.map((c) => (
            <p key={c.id} className="rounded-md bg-caution/10 px-3 py-2 text-[13px]"><span className="font-semibold">{c.title}.</span> {c.text}</p>
          ))}
        </div>
      ) : null}
    </div>
  );
}
