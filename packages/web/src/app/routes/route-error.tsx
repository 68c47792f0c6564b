import { isRouteErrorResponse, useRouteError } from "react-router-dom";
import { Button } from "../../components/ui/button";
import { Wordmark } from "../../components/ui/wordmark";

/** Last line of defence when a page fails to render: say so, and offer a reload. */
export function RouteError() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : error instanceof Error ? error.message : null;
  return (
    <div className="mx-auto flex min-h-screen max-w-md flex-col items-center justify-center gap-4 px-4 text-center">
      <Wordmark />
      <h1 className="text-2xl font-semibold">This page stopped working</h1>
      <p className="text-[15px] text-muted">Something unexpected happened. Reloading usually helps; your saved work is on the server.</p>
      {detail ? <p className="rounded border border-rule bg-panel px-3 py-2 font-mono text-sm">{detail}</p> : null}
      <Button onClick={() => window.location.reload()}>Reload the page</Button>
    </div>
  );
}
