import type { TemplateJson } from '@shared/schemas/checks';
import { formatZonedDay, formatZonedTime } from '../../../../lib/dates';

// Templates belong to the team, not to an event, so there is no venue zone: the tablet's own clock.
const here = Intl.DateTimeFormat().resolvedOptions().timeZone;

/** "Version 3 · edited Sat 5 Dec, 14:05 by Sam R." */
export function VersionLine({ template }: { template: Pick<TemplateJson, 'version' | 'updatedAt' | 'updatedBy'> }) {
  const at = new Date(template.updatedAt);
  return (
    <span className="tabular-nums">
      Version {template.version} · edited {formatZonedDay(at, here)}, {formatZonedTime(at, here, false)}
      {template.updatedBy && ` by ${template.updatedBy.name}`}
    </span>
  );
}
