import { Button } from "../../../components/ui/button";
import { Dialog } from "../../../components/ui/dialog";

/** Shown when the server's plan moved on while this device had unsaved edits. Neither choice loses anything. */
export function ConflictDialog({ open, currentVersion, busy, onKeepMine, onTakeTheirs, onClose }: {
  open: boolean;
  currentVersion: number;
  busy: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
  onClose: () => void;
}) {
  return (
    <Dialog open={open} onClose={onClose} title="The plan was changed somewhere else" description={`Someone saved version ${currentVersion} while you were editing. Your changes are safe on this device.`}>
      <div className="flex flex-col gap-3 text-[15px]">
        <div className="rounded-md border border-rule p-3">
          <p className="font-medium">Keep mine</p>
          <p className="text-sm text-muted">Save your plan as the newest version. Theirs stays in the plan's history.</p>
          <Button className="mt-2" pending={busy} onClick={onKeepMine}>Keep mine as a new version</Button>
        </div>
        <div className="rounded-md border border-rule p-3">
          <p className="font-medium">Load theirs</p>
          <p className="text-sm text-muted">Open their version. Yours is first saved into the plan's history, so you can go back to it.</p>
          <Button className="mt-2" variant="secondary" pending={busy} onClick={onTakeTheirs}>Load their version</Button>
        </div>
      </div>
    </Dialog>
  );
}
