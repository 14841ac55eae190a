export function Spinner({ className = 'size-5' }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" className={`shrink-0 animate-spin ${className}`}>
      <circle cx="12" cy="12" r="9" fill="none" stroke="currentColor" strokeOpacity={0.25} strokeWidth={3} />
      <path d="M21 12a9 9 0 0 0-9-9" fill="none" stroke="currentColor" strokeWidth={3} strokeLinecap="round" />
    </svg>
  );
}

/** Stands in for content that is on its way; the words matter when motion is reduced. */
export function Loading({ label }: { label: string }) {
  return (
    <div role="status" className="flex min-h-32 items-center justify-center gap-3 py-8 text-ink-muted">
      <Spinner className="size-6" />
      <span>{label}…</span>
    </div>
  );
}
