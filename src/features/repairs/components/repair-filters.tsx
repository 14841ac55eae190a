import type { ReactNode } from 'react';
import { useSearchParams } from 'react-router';
import type { SubsystemJson } from '@shared/schemas/repairs';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { OctagonIcon, UserIcon } from '../../../components/ui/icons';

export interface RepairFilterValues {
  mine: boolean;
  subsystem: string | null;
  blocking: boolean;
}

/**
 * Filters live in the address (`?mine=1&subsystem=arm&blocking=1`): a tablet reloaded, or a link
 * sent to a phone, shows the same board.
 */
export function useRepairFilters(): [RepairFilterValues, (next: Partial<RepairFilterValues>) => void] {
  const [params, setParams] = useSearchParams();
  const values: RepairFilterValues = {
    mine: params.get('mine') === '1',
    subsystem: params.get('subsystem') || null,
    blocking: params.get('blocking') === '1',
  };
  const set = (next: Partial<RepairFilterValues>) => {
    const merged = { ...values, ...next };
    const search = new URLSearchParams();
    if (merged.mine) search.set('mine', '1');
    if (merged.subsystem) search.set('subsystem', merged.subsystem);
    if (merged.blocking) search.set('blocking', '1');
    setParams(search, { replace: true });
  };
  return [values, set];
}

export const anyFilter = (values: RepairFilterValues) => values.mine || values.subsystem !== null || values.blocking;

function Toggle({ pressed, onClick, icon, children }: { pressed: boolean; onClick: () => void; icon: ReactNode; children: string }) {
  return (
    <button
      type="button"
      aria-pressed={pressed}
      onClick={onClick}
      className="inline-flex min-h-12 items-center gap-2 rounded-xl border-2 border-line-strong bg-surface px-4 font-semibold select-none aria-pressed:border-accent aria-pressed:bg-accent-soft aria-pressed:text-accent-ink"
    >
      {icon}
      {children}
    </button>
  );
}

interface RepairFiltersProps {
  values: RepairFilterValues;
  onChange: (next: Partial<RepairFilterValues>) => void;
  subsystems: SubsystemJson[];
  /** "Showing 3 of 12 tickets" while a filter is on. */
  shownCount: number;
  totalCount: number;
}

/** Mine, one subsystem, blocking only: toggles as big as any button, the state shown by tick, tint and border. */
export function RepairFilters({ values, onChange, subsystems, shownCount, totalCount }: RepairFiltersProps) {
  const filtered = anyFilter(values);
  return (
    <div role="group" aria-label="Filters" className="flex flex-wrap items-center gap-3">
      <Toggle pressed={values.mine} onClick={() => onChange({ mine: !values.mine })} icon={<UserIcon className="size-5" />}>
        Mine
      </Toggle>
      <Toggle pressed={values.blocking} onClick={() => onChange({ blocking: !values.blocking })} icon={<OctagonIcon className="size-5" />}>
        Blocking only
      </Toggle>
      <label className="flex min-w-0 items-center gap-2">
        <span className="font-semibold">Subsystem</span>
        <select
          className={`${controlClass} w-auto max-w-56 min-w-0`}
          value={values.subsystem ?? ''}
          onChange={(event) => onChange({ subsystem: event.target.value || null })}
        >
          <option value="">All</option>
          {/* From a link, a subsystem since taken off the list still filters. */}
          {values.subsystem && !subsystems.some((subsystem) => subsystem.key === values.subsystem) && <option value={values.subsystem}>{values.subsystem}</option>}
          {subsystems.map((subsystem) => (
            <option key={subsystem.key} value={subsystem.key}>
              {subsystem.label}
            </option>
          ))}
        </select>
      </label>
      {filtered && (
        <>
          <p role="status" className="text-ink-muted tabular-nums">
            Showing {shownCount} of {totalCount}
          </p>
          <Button variant="quiet" onClick={() => onChange({ mine: false, subsystem: null, blocking: false })}>
            Show all
          </Button>
        </>
      )}
    </div>
  );
}
