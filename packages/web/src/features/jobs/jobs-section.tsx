import type { WorkOrder } from "@hushmark/schemas";
import { Card, CardHeader } from "../../components/ui/card";
import { EmptyState } from "../../components/ui/empty-state";
import { ErrorState } from "../../components/ui/error-state";
import { PageLoading } from "../../components/ui/spinner";
import { useCurrentMe } from "../auth/components/use-current-me";
import { jobPhotoUrl, useJobPhotos, useUploadJobPhoto } from "./api/photos";
import { useUpdateTask, useWorkOrders } from "./api/work-orders";

const statusWords = { todo: "To do", doing: "Doing", done: "Done" } as const;

/** Jobs: one work order per approved upgrade, with materials, steps, cautions and the checklist. */
export default function JobsSection({ projectId }: { projectId: string }) {
  const orders = useWorkOrders(projectId);
  if (orders.isPending) return <PageLoading label="Opening the jobs" />;
  if (orders.isError) return <ErrorState title="The work orders did not load" error={orders.error} onRetry={() => void orders.refetch()} />;
  if (orders.data.workOrders.length === 0) return <EmptyState title="No work orders yet">Work orders are made when the client approves a proposal.</EmptyState>;
  return (
    <div className="flex flex-col gap-5">
      {orders.data.workOrders.map((w) => <WorkOrderCard key={w.id} order={w} projectId={projectId} />)}
    </div>
  );
}

function WorkOrderCard({ order, projectId }: { order: WorkOrder; projectId: string }) {
  const me = useCurrentMe();
  const update = useUpdateTask(projectId);
  const canTick = me.membership.role === "owner" || me.membership.role === "surveyor";
  const done = order.tasks.filter((t) => t.status === "done").length;
  return (
    <Card>
      <CardHeader title={order.title} description={`${done} of ${order.tasks.length} done`} />
      <div className="grid gap-5 p-5 md:grid-cols-2">
        <div className="flex flex-col gap-3 text-sm">
          <section>
            <h3 className="font-semibold">Materials</h3>
            <ul className="list-disc pl-5 tabular-nums">{order.materials.map((m, i) => <li key={i}>{m.quantity} {m.unit} — {m.name}</li>)}</ul>
          </section>
          <section>
            <h3 className="font-semibold">Steps</h3>
            <ol className="list-decimal pl-5">{order.steps.map((s, i) => <li key={i}>{s}</li>)}</ol>
          </section>
          {order.cautions.length ? (
            <section className="rounded-md border border-caution/40 bg-caution/5 p-3">
              <h3 className="font-semibold">Cautions</h3>
              <ul className="list-disc pl-5">{order.cautions.map((c, i) => <li key={i}>{c.text}</li>)}</ul>
            </section>
          ) : null}
        </div>
        <section aria-label={`Checklist for ${order.title}`}>
          <h3 className="mb-1 text-sm font-semibold">Checklist</h3>
          <ul className="flex flex-col gap-1">
            {order.tasks.map((t) => (
              <li key={t.id} className="flex flex-wrap items-center gap-2 rounded-md border border-rule px-3 py-1.5 text-sm">
                <span className={`min-w-0 flex-1 ${t.status === "done" ? "text-muted line-through" : ""}`}>{t.text}</span>
                <span className="text-muted">{t.assigneeName ?? ""}</span>
                <select aria-label={`Status of: ${t.text}`} className="min-h-11 rounded-md border border-rule bg-panel px-2" value={t.status} disabled={!canTick || update.isPending}
                  onChange={(e) => update.mutate({ taskId: t.id, patch: { status: e.target.value as "todo" | "doing" | "done" } })}>
                  {Object.entries(statusWords).map(([k, v]) => <option key={k} value={k}>{v}</option>)}
                </select>
                {canTick && t.assigneeName !== me.user.displayName ? (
                  <button className="min-h-11 px-1 text-brand underline" onClick={() => update.mutate({ taskId: t.id, patch: { assignToMe: true } })}>Take it</button>
                ) : null}
              </li>
            ))}
          </ul>
          {update.isError ? <p role="alert" className="mt-2 text-sm text-danger">{update.error.message}</p> : null}
          <WorkPhotos projectId={projectId} order={order} canUpload={canTick} />
        </section>
      </div>
    </Card>
  );
}

function WorkPhotos({ projectId, order, canUpload }: { projectId: string; order: WorkOrder; canUpload: boolean }) {
  const photos = useJobPhotos(projectId);
  const upload = useUploadJobPhoto(projectId);
  const mine = (photos.data ?? []).filter((p) => p.elementId === order.elementId);
  return (
    <div className="mt-3">
      <h3 className="mb-1 text-sm font-semibold">Photos of {order.elementName}</h3>
      {mine.length === 0 ? <p className="text-sm text-muted">No photos yet.</p> : null}
      <ul className="flex flex-wrap gap-2">
        {mine.map((p) => <li key={p.id}><img src={jobPhotoUrl(projectId, p.id)} alt={p.caption || `Photo of ${order.elementName}`} className="h-20 w-28 rounded border border-rule object-cover" /></li>)}
      </ul>
      {canUpload ? (
        <label className="mt-2 flex min-h-11 items-center gap-2 text-sm font-medium">
          Add a photo
          <input type="file" accept="image/jpeg,image/png,image/webp" className="text-sm" disabled={upload.isPending}
            onChange={(e) => { const f = e.target.files?.[0]; if (f) upload.mutate({ file: f, elementId: order.elementId, caption: order.title }); e.target.value = ""; }} />
        </label>
      ) : null}
      {upload.isError ? <p role="alert" className="text-sm text-danger">{upload.error.message}</p> : null}
    </div>
  );
}
