/** The product mark: a "P" drawn like a wrench hook, in the accent colour. */
export function Wordmark({ size = 'md' }: { size?: 'md' | 'lg' }) {
  const mark = size === 'lg' ? 'size-12' : 'size-9';
  const text = size === 'lg' ? 'text-4xl' : 'text-2xl';
  return (
    <span className="inline-flex items-center gap-2.5">
      <svg viewBox="0 0 32 32" aria-hidden="true" className={`${mark} shrink-0`}>
        <rect width="32" height="32" rx="8" className="fill-accent" />
        <path
          d="M10 24V8h7.5a5 5 0 0 1 0 10H14"
          fill="none"
          strokeWidth="3.2"
          strokeLinecap="round"
          strokeLinejoin="round"
          className="stroke-on-accent"
        />
        <circle cx="22.5" cy="23" r="2.4" className="fill-on-accent" />
      </svg>
      <span className={`${text} font-extrabold tracking-tight`}>Pitwright</span>
    </span>
  );
}
