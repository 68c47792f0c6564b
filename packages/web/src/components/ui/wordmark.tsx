/** Hushmark's own mark: a wall with the sound fading behind it. */
export function Wordmark({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 font-semibold tracking-tight ${className}`}>
      <svg aria-hidden="true" viewBox="0 0 32 32" className="size-7 shrink-0">
        <rect width="32" height="32" rx="7" fill="#1f7a74" />
        <rect x="7" y="7" width="4" height="18" rx="1" fill="#f7f5f0" />
        <path d="M15 11c2.2 1.4 2.2 8.6 0 10" fill="none" stroke="#f7f5f0" strokeWidth="2.2" strokeLinecap="round" />
        <path d="M19 9c3.4 2.4 3.4 11.6 0 14" fill="none" stroke="#f7f5f0" strokeWidth="2.2" strokeLinecap="round" opacity="0.6" />
        <path d="M23 7.5c4.2 3.4 4.2 13.6 0 17" fill="none" stroke="#f7f5f0" strokeWidth="2.2" strokeLinecap="round" opacity="0.3" />
      </svg>
      <span className="text-lg">Hushmark</span>
    </span>
  );
}
