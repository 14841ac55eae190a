/** "just now", "2 min ago", "3 h ago", "2 days ago": how long ago, as said across a pit. */
export function formatAgo(at: string, now: Date): string {
  // A few seconds ahead is clock noise between tablet and server, not the future.
  const seconds = Math.max(0, (now.getTime() - Date.parse(at)) / 1000);
  if (seconds < 45) return 'just now';
  const minutes = Math.round(seconds / 60);
  if (minutes < 60) return `${minutes} min ago`;
  const hours = Math.floor(minutes / 60);
  if (hours < 24) return `${hours} h ago`;
  const days = Math.floor(hours / 24);
  return days === 1 ? 'yesterday' : `${days} days ago`;
}

/**
 * How long ago an instant was, with the exact time on the element for those who need it. `now`
 * comes from the page (one server-corrected clock for every row, not a timer per row).
 */
export function RelativeTime({ at, now }: { at: string; now: Date }) {
  return (
    <time dateTime={at} title={new Date(at).toLocaleString()} className="tabular-nums">
      {formatAgo(at, now)}
    </time>
  );
}
