import { useState } from "react";
import { Button } from "../../components/ui/button";
import { Card, CardHeader } from "../../components/ui/card";
import { ErrorState } from "../../components/ui/error-state";
import { PageHeader } from "../../components/ui/page-header";
import { PageLoading } from "../../components/ui/spinner";
import { isApiError } from "../../lib/api-client";
import { useCurrentMe } from "../auth/components/use-current-me";
import { PRICE_BOOK_CSV_URL, useFirmSettings, useImportPriceBook, usePriceBook } from "./api/price-book";
import { AddItemForm } from "./components/add-item-form";
import { FirmSettingsForm } from "./components/firm-settings-form";
import { PriceBookTable } from "./components/price-book-table";

/** The firm's price book of upgrades and its commercial settings; owners edit, the rest of the staff read. */
export default function PriceBookRoute() {
  const me = useCurrentMe();
  const owner = me.membership.role === "owner";
  const book = usePriceBook();
  const settings = useFirmSettings(owner || me.membership.role === "planner");
  if (me.membership.role === "client") return <ErrorState title="The price book is for the firm's team" error={new Error("")} />;
  if (book.isPending) return <PageLoading label="Opening the price book" />;
  if (book.isError) return <ErrorState title="The price book did not load" error={book.error} onRetry={() => void book.refetch()} />;
  return (
    <div className="flex flex-col gap-5">
      <PageHeader title="Price book" description={owner ? "The upgrades the firm offers: what each applies to, what it does to the sound, and what it costs." : "The firm's upgrades and prices (only the owner can change them)."} />
      <PriceBookTable items={book.data.items} currency={book.data.currency} editable={owner} />
      {owner ? (
        <Card>
          <CardHeader title="Add an upgrade" description="Prices in the firm's currency; fixed costs and band-by-band figures can be set through CSV." />
          <div className="p-5"><AddItemForm /></div>
        </Card>
      ) : null}
      <div className="grid gap-5 lg:grid-cols-2">
        <Card>
          <CardHeader title="CSV" description="Export to edit in a spreadsheet; import to add or update by code." />
          <div className="p-5">{owner ? <CsvImport /> : <a className="font-medium text-brand underline" href={PRICE_BOOK_CSV_URL} download>Download the price book (CSV)</a>}</div>
        </Card>
        {owner && settings.data ? (
          <Card>
            <CardHeader title="Proposal settings" />
            <div className="p-5"><FirmSettingsForm settings={settings.data} /></div>
          </Card>
        ) : null}
      </div>
    </div>
  );
}

function CsvImport() {
  const [csv, setCsv] = useState("");
  const [mode, setMode] = useState<"merge" | "replace">("merge");
  const [result, setResult] = useState<string | null>(null);
  const [problems, setProblems] = useState<{ row: number; column: string; message: string }[]>([]);
  const run = useImportPriceBook();
  return (
    <div className="flex flex-col gap-3">
      <a className="min-h-11 content-center font-medium text-brand underline" href={PRICE_BOOK_CSV_URL} download>Download the price book (CSV)</a>
      <label className="flex flex-col gap-1 text-sm font-medium">
        CSV file to import
        <input type="file" accept=".csv,text/csv" className="text-sm" onChange={(e) => void e.target.files?.[0]?.text().then(setCsv)} />
      </label>
      <fieldset className="flex gap-4 text-sm">
        <legend className="sr-only">Import mode</legend>
        <label className="flex min-h-11 items-center gap-2"><input type="radio" checked={mode === "merge"} onChange={() => setMode("merge")} /> Add and update</label>
        <label className="flex min-h-11 items-center gap-2"><input type="radio" checked={mode === "replace"} onChange={() => setMode("replace")} /> Replace the whole price book</label>
      </fieldset>
      <div>
        <Button variant="secondary" disabled={!csv} pending={run.isPending} onClick={() => {
          setResult(null);
          setProblems([]);
          run.mutate({ csv, mode }, {
            onSuccess: (r) => setResult(`${r.added} added, ${r.updated} updated, ${r.removed} removed.`),
            onError: (e) => {
              setResult(isApiError(e) ? e.message : "Not imported.");
              if (isApiError(e) && Array.isArray(e.details)) setProblems(e.details as typeof problems);
            },
          });
        }}>Import</Button>
      </div>
      {result ? <p role="status" className="text-sm">{result}</p> : null}
      {problems.length ? <ul className="list-disc pl-5 text-sm text-danger">{problems.slice(0, 10).map((p, i) => <li key={i}>Row {p.row}, {p.column}: {p.message}</li>)}</ul> : null}
    </div>
  );
}
