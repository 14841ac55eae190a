/** Every checklist template of the team, by phase. (Being built.) */
export function TemplatesPage() {
  return <p>Templates</p>;
}
