import type { OptionSearchResult, PriceBookItem, Scenario, ScenarioItem, ScenarioSetup } from "@hushmark/schemas";
import { useCallback, useMemo, useState } from "react";
import { useNavigate } from "react-router-dom";
import { Card, CardHeader } from "../../components/ui/card";
import { EmptyState } from "../../components/ui/empty-state";
import { ErrorState } from "../../components/ui/error-state";
import { PageLoading, Spinner } from "../../components/ui/spinner";
import { paths } from "../../config/paths";
import { isApiError } from "../../lib/api-client";
import { usePriceBook } from "../price-book/api/price-book";
import { usePlan } from "../projects/api/get-plan";
import { useCreateProposal } from "../proposals/api/proposals";
import { useSaveScenario, useScenarios, useWeakLinks } from "./api/scenarios";
import { BestSearch, SingleRanking } from "./components/best-search";
import { ScenarioComparison } from "./components/comparison";
import { FrontierChart } from "./components/frontier-chart";
import { PlanPick } from "./components/plan-pick";
import { EvaluationSummary, ScenarioBuilder } from "./components/scenario-builder";
import { defaultSetup, SetupFields } from "./components/setup-fields";
import { WeakLinks } from "./components/weak-links";

/** Options: weak links, scenarios built from them, best within limits and the cost–level frontier. */
export default function OptionsSection({ projectId }: { projectId: string }) {
  const plan = usePlan(projectId);
  const book = usePriceBook();
  if (plan.isPending || book.isPending) return <PageLoading label="Opening Options" />;
  if (plan.isError) return <ErrorState title="The plan did not load" error={plan.error} onRetry={() => void plan.refetch()} />;
  if (book.isError) return <ErrorState title="The price book did not load" error={book.error} onRetry={() => void book.refetch()} />;
  const initial = defaultSetup(plan.data.document, plan.data.version);
  if (!initial || plan.data.version === 0) return <EmptyState title="Sketch the plan first">Options need a plan with at least two rooms.</EmptyState>;
  return <OptionsScreen projectId={projectId} document={plan.data.document} initial={initial} items={book.data.items} currency={book.data.currency} />;
}

function OptionsScreen({ projectId, document, initial, items, currency }: { projectId: string; document: Record<string, unknown>; initial: ScenarioSetup; items: PriceBookItem[]; currency: string }) {
  const navigate = useNavigate();
  const [setup, setSetup] = useState(initial);
  const [chosen, setChosen] = useState<Set<string>>(new Set());
  const [draft, setDraft] = useState<{ id: string | null; name: string; items: ScenarioItem[] }>({ id: null, name: "Scenario 1", items: [] });
  const [saveError, setSaveError] = useState<string | null>(null);
  const [searchResult, setSearchResult] = useState<OptionSearchResult | null>(null);
  const [proposing, setProposing] = useState<string | null>(null);
  const request = useMemo(() => ({ ...setup, paths: 5 }), [setup]);
  const weak = useWeakLinks(projectId, request);
  const scenarios = useScenarios(projectId);
  const save = useSaveScenario(projectId);
  const createProposal = useCreateProposal(projectId);
  const bookById = useMemo(() => new Map(items.map((i) => [i.id, i])), [items]);
  const elementNames = useMemo(() => new Map((weak.data?.elements ?? []).map((e) => [e.elementId, e.name])), [weak.data]);
  const onResult = useCallback((r: OptionSearchResult | null) => setSearchResult(r), []);
  const mine = (scenarios.data?.scenarios ?? []).filter((s) => s.setup.receiverId === setup.receiverId);
  const toggle = (id: string) => setChosen((c) => { const n = new Set(c); if (n.has(id)) n.delete(id); else n.add(id); return n; });
  const add = (elementId: string, itemId: string) => setDraft((d) => ({ ...d, items: [...d.items, { priceBookItemId: itemId, elementId }] }));

  async function saveDraft() {
    setSaveError(null);
    try {
      const saved = await save.mutateAsync({ id: draft.id, input: { name: draft.name, setup, items: draft.items } });
      setDraft({ id: saved.id, name: saved.name, items: saved.items });
    } catch (e) {
      setSaveError(isApiError(e) ? e.message : "The scenario was not saved.");
    }
  }

  function edit(s: Scenario) {
    setDraft({ id: s.id, name: s.name, items: s.items });
    setSetup(s.setup);
  }

  async function propose(s: Scenario) {
    setProposing(s.id);
    try {
      await createProposal.mutateAsync({ scenarioId: s.id, note: "" });
      void navigate(paths.projectSection(projectId, "proposal"));
    } catch (e) {
      setSaveError(isApiError(e) ? e.message : "The proposal was not made.");
    } finally {
      setProposing(null);
    }
  }

  const current = draft.id ? scenarios.data?.scenarios.find((s) => s.id === draft.id) : undefined;
  return (
    <div className="flex flex-col gap-5">
      <Card>
        <CardHeader title="What to make quieter" description="The noise, where it starts, the room that should be quiet and its target." />
        <div className="p-5"><SetupFields document={document} setup={setup} onChange={(s) => { setSetup(s); setChosen(new Set()); }} /></div>
      </Card>
      <Card>
        <CardHeader title="Pick on the plan" description="Click a wall part, door, window, vent or room to upgrade it." />
        <div className="p-5">
          {weak.isPending ? <Spinner label="Working out the paths" /> : weak.isError ? <p role="alert" className="text-sm text-danger">{weak.error.message}</p> : (
            <PlanPick document={document} elements={weak.data.elements} receiverId={setup.receiverId} receiverName={weak.data.receiver.name} items={items} currency={currency} chosen={chosen}
              onToggle={toggle} onAdd={add} />
          )}
        </div>
      </Card>
      <div className="grid gap-5 lg:grid-cols-[3fr_2fr]">
        <Card>
          <CardHeader title="Where the sound gets through" description={weak.data ? `${weak.data.receiver.dba.toFixed(1)} dBA reaches ${weak.data.receiver.name} now (NC ${weak.data.receiver.nc ?? "—"}).` : "The weakest links first."} />
          <div className="px-5 py-2">
            {weak.isPending ? <Spinner label="Working out the paths" /> : weak.isError ? <p role="alert" className="text-sm text-danger">{weak.error.message}</p> : (
              <WeakLinks elements={weak.data.elements} items={items} currency={currency} chosen={chosen} onToggle={toggle} onAdd={add} />
            )}
          </div>
        </Card>
        <Card>
          <CardHeader title={draft.id ? `Scenario: ${draft.name}` : "New scenario"} actions={draft.id ? <button className="min-h-11 text-sm text-brand underline" onClick={() => setDraft({ id: null, name: `Scenario ${(scenarios.data?.scenarios.length ?? 0) + 1}`, items: [] })}>Start another</button> : null} />
          <div className="flex flex-col gap-4 p-5">
            <ScenarioBuilder name={draft.name} items={draft.items} book={bookById} elementNames={elementNames} onName={(name) => setDraft({ ...draft, name })} onRemove={(i) => setDraft({ ...draft, items: draft.items.filter((_, k) => k !== i) })} onSave={() => void saveDraft()} saving={save.isPending} error={saveError} />
            {current?.evaluation ? <EvaluationSummary ev={current.evaluation} currency={currency} /> : null}
          </div>
        </Card>
      </div>
      <Card>
        <CardHeader title="Scenarios side by side" />
        <div className="p-5"><ScenarioComparison scenarios={mine} currency={currency} onEdit={edit} onPropose={(s) => void propose(s)} proposing={proposing} /></div>
      </Card>
      <Card>
        <CardHeader title="Best within limits" description="Every upgrade in the price book that fits a ticked weak link, tried alone and together within the client's limits." />
        <div className="p-5">
          <BestSearch projectId={projectId} setup={setup} elementIds={[...chosen]} currency={currency} onResult={onResult}
            onKeep={(r) => setDraft({ id: null, name: "Best within limits", items: r.best.items.map((i) => ({ priceBookItemId: i.priceBookItemId, elementId: i.elementId })) })} />
        </div>
      </Card>
      {searchResult ? (
        <div className="grid gap-5 lg:grid-cols-2">
          <Card>
            <CardHeader title="Which single upgrade helps most" />
            <div className="p-5"><SingleRanking result={searchResult} currency={currency} /></div>
          </Card>
          <Card>
            <CardHeader title="Cost against level" />
            <div className="p-5">
              <FrontierChart frontier={searchResult.frontier} baseDba={searchResult.base.dba} currency={currency}
                targetDba={searchResult.targetDba}
                scenarios={mine.flatMap((s) => (s.evaluation ? [{ cost: s.evaluation.totals.cost, dba: s.evaluation.after.dba, label: s.name }] : []))} />
            </div>
          </Card>
        </div>
      ) : null}
    </div>
  );
}
