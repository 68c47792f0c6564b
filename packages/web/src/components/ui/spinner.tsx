export function Spinner({ size = "md", label = "Loading" }: { size?: "sm" | "md"; label?: string }) {
  const dimension = size === "sm" ? "size-4 border-2" : "size-6 border-[3px]";
  return (
    <span role={label ? "status" : undefined} className="inline-flex items-center gap-2">
      <span aria-hidden="true" className={`${dimension} animate-spin rounded-full border-current border-r-transparent opacity-80`} />
      {label ? <span className="sr-only">{label}</span> : null}
    </span>
  );
}

/** A grey placeholder the shape of content still on its way. */
export function Skeleton({ className = "" }: { className?: string }) {
  return <span aria-hidden="true" className={`block animate-pulse rounded bg-rule/60 ${className}`} />;
}

export function PageLoading({ label = "Loading" }: { label?: string }) {
  return (
    <div className="flex min-h-[40vh] items-center justify-center text-muted">
      <Spinner label={label} />
      <span aria-hidden="true" className="ml-2">
        {label}…
      </span>
    </div>
  );
}
