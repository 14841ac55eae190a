import { Component, lazy, Suspense, type ReactNode } from 'react';
import { SOC_TABLE_LABELS, type BatterySettings, type HealthJson } from '@shared/domain/battery-state';
import type { ReadingJson } from '@shared/schemas/batteries';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { Loading } from '../../../components/ui/loading';
import { UnrestedMark } from './charge-value';

// Its own chunk: the charting library is fetched when a battery page is opened, not at start-up.
const BatteryTrendCharts = lazy(() => import('./battery-trend-charts'));

/** A chunk that fails to arrive (the Wi-Fi dropped) costs the charts, not the battery page. */
class ChartsBoundary extends Component<{ children: ReactNode }, { failed: unknown }> {
  state = { failed: null as unknown };

  static getDerivedStateFromError(failed: unknown) {
    return { failed };
  }

  render() {
    if (this.state.failed === null) return this.props.children;
    return (
      <div className="flex flex-col items-start gap-3">
        <ErrorNotice title="Could not load the charts" error={this.state.failed} />
        <Button variant="secondary" onClick={() => window.location.reload()}>
          Reload the page
        </Button>
      </div>
    );
  }
}

/** The legend's shapes, drawn as the charts draw them. */
function Legend() {
  return (
    <ul className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
      <li className="flex items-center gap-2">
        <svg viewBox="0 0 12 12" aria-hidden="true" className="size-3.5 shrink-0">
          <circle cx="6" cy="6" r="5" className="fill-accent" />
        </svg>
        Rested reading
      </li>
      <li className="flex items-center gap-2 text-warning">
        <UnrestedMark />
        <span className="text-ink">Not rested 4 h: not reliable</span>
      </li>
    </ul>
  );
}

/**
 * The battery's voltage and resistance over time, with a caption that says where the charge
 * figures come from and why some points are drawn differently.
 */
export function BatteryTrends({ readings, health, settings }: { readings: ReadingJson[]; health: HealthJson; settings: BatterySettings | undefined }) {
  // Until the settings load (or if they cannot), the server's default table is the honest guess.
  const table = settings?.socTable ?? 'bci';
  return (
    <section aria-labelledby="trends-title" className="flex flex-col gap-4 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:p-5">
      <h2 id="trends-title" className="text-2xl font-bold">
        Trends
      </h2>
      {readings.length === 0 ? (
        <p className="text-lg text-ink-muted">No readings yet: the charts start with the first one.</p>
      ) : (
        <ChartsBoundary>
          <Suspense fallback={<Loading label="Loading the charts" />}>
            <BatteryTrendCharts readings={readings} health={health} settings={settings ?? null} />
          </Suspense>
        </ChartsBoundary>
      )}
      <Legend />
      <p className="text-ink-muted">
        The state of charge comes from each resting voltage, read in the {SOC_TABLE_LABELS[table]} table
        {table === 'bci' ? '; the team may pick another in its battery settings' : ', which the team picked instead of the Battery Council International default'}. A battery needs about 4 hours off the charger and out of the robot before its voltage says how full it is: readings taken sooner are drawn as hollow diamonds and
        marked “not rested”.
      </p>
    </section>
  );
}
