import { useMemo } from 'react';
import { SelectField } from '../../../components/ui/field';
import { describeZone, formatZonedTime, readableZone } from '../../../lib/dates';
import { useNow } from '../../../lib/use-now';

export const browserTimeZone = (): string => Intl.DateTimeFormat().resolvedOptions().timeZone;

/** Zones grouped by region ("Europe", "America"...), so a tablet's picker is a short walk, not 400 rows. */
function groupZones(extra: string): [string, string[]][] {
  const zones = new Set(Intl.supportedValuesOf('timeZone'));
  zones.add('UTC');
  // Keep a stored zone selectable even if this browser spells it differently (an alias).
  if (extra) zones.add(extra);
  const groups = new Map<string, string[]>();
  for (const zone of zones) {
    const region = zone.includes('/') ? zone.slice(0, zone.indexOf('/')) : 'Other';
    groups.set(region, [...(groups.get(region) ?? []), zone]);
  }
  return [...groups.entries()].sort(([a], [b]) => a.localeCompare(b));
}

function ZoneNow({ timeZone }: { timeZone: string }) {
  const now = useNow(60_000);
  try {
    return (
      <span className="tabular-nums">
        The venue's clock reads {formatZonedTime(now, timeZone, false)} now ({describeZone(now, timeZone)})
      </span>
    );
  } catch {
    return null;
  }
}

interface TimeZoneSelectProps {
  value: string;
  onChange: (timeZone: string) => void;
  error?: string;
}

export function TimeZoneSelect({ value, onChange, error }: TimeZoneSelectProps) {
  const groups = useMemo(() => groupZones(value), [value]);
  return (
    <SelectField
      label="Time zone"
      value={value}
      onChange={(event) => onChange(event.target.value)}
      error={error}
      hint={value ? <ZoneNow timeZone={value} /> : undefined}
    >
      {groups.map(([region, zones]) => (
        <optgroup key={region} label={region}>
          {zones.map((zone) => (
            <option key={zone} value={zone}>
              {readableZone(zone)}
            </option>
          ))}
        </optgroup>
      ))}
    </SelectField>
  );
}
