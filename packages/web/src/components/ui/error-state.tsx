import { isApiError } from "../../lib/api-client";
import { Button } from "./button";

/** Explains a failed load in plain words and offers to try again. */
export function ErrorState({ error, title = "This did not load", onRetry }: { error: unknown; title?: string; onRetry?: () => void }) {
  const message = isApiError(error) ? error.message : "Something went wrong on our side.";
  return (
    <div role="alert" className="flex flex-col items-center gap-2 rounded-lg border border-danger/30 bg-danger/5 px-6 py-8 text-center">
      <p className="text-base font-semibold text-danger">{title}</p>
      <p className="max-w-md text-sm text-ink">{message}</p>
      {onRetry ? (
        <Button variant="secondary" className="mt-2" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}
