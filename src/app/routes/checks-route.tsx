/** The Checks area: runs for the next match first, then the other runs. (Being built.) */
export function ChecksRoute() {
  return <p>Checks</p>;
}

/** One run, full page. (Being built.) */
export function RunRoute() {
  return <p>Run</p>;
}
