import { useState, type MouseEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import type { BatteryJson } from '@shared/schemas/batteries';
import { RelativeTime } from '../../../components/ui/relative-time';
import { formatMilliohm } from './battery-format';
import { BatteryStatusTag, HealthTag } from './battery-tags';
import { EstimatedCharge } from './charge-value';
import { DEFAULT_FLEET_SORT, FLEET_COLUMNS, nextFleetSort, sortFleet, type FleetColumn, type FleetSort } from './fleet-sort';

const HEADINGS: Record<FleetColumn, string> = {
  label: 'Battery',
  status: 'Status',
  charge: 'Charge',
  resistance: 'Resistance',
  health: 'Health',
  lastUsed: 'Last used',
  uses: 'Uses this event',
};

function SortArrow({ direction }: { direction: FleetSort['direction'] | null }) {
  // Both arrows when unsorted, one when sorted: the shape says it, the colour only helps.
  return (
    <svg viewBox="0 0 12 16" aria-hidden="true" focusable="false" className={`h-4 w-3 shrink-0 ${direction ? 'text-accent-ink' : 'text-ink-muted'}`}>
      {direction !== 'descending' && <path d="M6 1.5L10.5 6.5h-9z" fill="currentColor" />}
      {direction !== 'ascending' && <path d="M6 14.5L1.5 9.5h9z" fill="currentColor" />}
    </svg>
  );
}

// The label column stays put while the rest scrolls sideways on a phone.
const stickyCell = 'sticky left-0 z-10 bg-surface group-hover:bg-sunken';

/**
 * The fleet, one big row per battery: a tap anywhere on a row opens the battery (its label is
 * the link for keyboards and screen readers). Each header is a sort button; `aria-sort` says
 * which column orders the rows.
 */
export function FleetTable({ batteries, now }: { batteries: BatteryJson[]; now: Date }) {
  const navigate = useNavigate();
  const [sort, setSort] = useState<FleetSort>(DEFAULT_FLEET_SORT);
  const rows = sortFleet(batteries, sort);

  const openRow = (battery: BatteryJson) => (event: MouseEvent) => {
    // The label's own link already navigates; a text selection is not a tap.
    if ((event.target as HTMLElement).closest('a') || window.getSelection()?.toString()) return;
    void navigate(`/batteries/${battery.id}`);
  };

  // Relative: the screen-reader-only words inside are absolutely placed; they must scroll with
  // the table, not widen the whole page.
  return (
    <div className="relative overflow-x-auto rounded-2xl border border-line bg-surface shadow-sm">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">
          The team&apos;s batteries, sorted by {HEADINGS[sort.column].toLowerCase()}, {sort.direction}
        </caption>
        <thead className="bg-sunken text-sm">
          <tr>
            {FLEET_COLUMNS.map((column) => {
              const sorted = sort.column === column;
              return (
                <th
                  key={column}
                  scope="col"
                  aria-sort={sorted ? sort.direction : undefined}
                  className={`p-0 align-bottom ${column === 'label' ? 'sticky left-0 z-10 bg-sunken' : ''}`}
                >
                  <button
                    type="button"
                    onClick={() => setSort((current) => nextFleetSort(current, column))}
                    className={`flex min-h-12 w-full items-center gap-1 px-2 py-2 text-left leading-tight hover:bg-line/50 ${sorted ? 'font-bold text-ink' : 'font-semibold text-ink-muted'}`}
                  >
                    {column === 'uses' ? (
                      // Short on screen so the table fits a portrait tablet; read out in full.
                      <span>
                        Uses<span className="sr-only"> this event</span>
                      </span>
                    ) : (
                      HEADINGS[column]
                    )}
                    <SortArrow direction={sorted ? sort.direction : null} />
                  </button>
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {rows.map((battery) => (
            <tr
              key={battery.id}
              onClick={openRow(battery)}
              className={`group cursor-pointer border-t border-line hover:bg-sunken ${battery.status === 'retired' ? 'text-ink-muted' : ''}`}
            >
              <th scope="row" className={`px-2 py-3 ${stickyCell}`}>
                <Link to={`/batteries/${battery.id}`} className="inline-flex min-h-12 min-w-12 items-center text-2xl font-extrabold text-accent-ink underline-offset-4 hover:underline">
                  {battery.label}
                </Link>
              </th>
              <td className="px-2 py-3 whitespace-nowrap">
                <BatteryStatusTag status={battery.status} />
              </td>
              <td className="px-2 py-3">
                <EstimatedCharge battery={battery} />
              </td>
              <td className="px-2 py-3 text-lg whitespace-nowrap tabular-nums">
                {battery.latestReading ? formatMilliohm(battery.latestReading.internalResistanceMilliohm) : <span className="text-ink-muted">–</span>}
              </td>
              <td className="px-2 py-3 whitespace-nowrap">
                <HealthTag status={battery.health.status} />
              </td>
              <td className="px-2 py-3 whitespace-nowrap">{battery.lastUsedAt ? <RelativeTime at={battery.lastUsedAt} now={now} /> : <span className="text-ink-muted">Not yet</span>}</td>
              <td className="px-2 py-3 text-lg tabular-nums">{battery.usesThisEvent}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
