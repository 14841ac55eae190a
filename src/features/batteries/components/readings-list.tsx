import type { ReadingJson } from '@shared/schemas/batteries';
import { RelativeTime } from '../../../components/ui/relative-time';
import { formatMilliohm, formatVolts } from './battery-format';
import { ChargeValue } from './charge-value';

const takenAt = new Intl.DateTimeFormat(undefined, { weekday: 'short', day: 'numeric', month: 'short', hour: 'numeric', minute: '2-digit' });

function restWords(reading: ReadingJson): string {
  if (!reading.rested) return 'Not rested';
  if (reading.restedMinutes === null) return 'Rested';
  const hours = Math.floor(reading.restedMinutes / 60);
  const minutes = reading.restedMinutes % 60;
  return `Rested ${hours > 0 ? `${hours} h${minutes > 0 ? ` ${minutes} min` : ''}` : `${minutes} min`}`;
}

/** Every reading, newest first: what the analyzer said, the charge read from it, and who took it. */
export function ReadingsList({ readings, now }: { readings: ReadingJson[]; now: Date }) {
  const newestFirst = [...readings].sort((a, b) => Date.parse(b.takenAt) - Date.parse(a.takenAt));
  return (
    <section aria-labelledby="readings-title" className="flex flex-col gap-3">
      <h2 id="readings-title" className="text-2xl font-bold">
        Readings <span className="font-normal text-ink-muted tabular-nums">({readings.length})</span>
      </h2>
      {readings.length === 0 ? (
        <p className="text-lg text-ink-muted">None yet.</p>
      ) : (
        <div className="overflow-x-auto rounded-2xl border border-line bg-surface shadow-sm">
          <table className="w-full border-collapse text-left">
            <thead className="bg-sunken text-sm text-ink-muted">
              <tr>
                <th scope="col" className="px-2 py-2 font-semibold">Taken, by</th>
                <th scope="col" className="px-2 py-2 font-semibold">Voltage</th>
                <th scope="col" className="px-2 py-2 font-semibold">Resistance</th>
                <th scope="col" className="px-2 py-2 font-semibold">Charge</th>
                <th scope="col" className="px-2 py-2 font-semibold">Rest</th>
                <th scope="col" className="px-2 py-2 font-semibold">Temp.</th>
              </tr>
            </thead>
            <tbody>
              {newestFirst.map((reading) => (
                <tr key={reading.id} className="border-t border-line">
                  <td className="px-2 py-2.5">
                    <span className="flex flex-col leading-tight">
                      <span className="font-semibold whitespace-nowrap">{takenAt.format(new Date(reading.takenAt))}</span>
                      <span className="text-sm text-ink-muted">
                        <RelativeTime at={reading.takenAt} now={now} /> by {reading.takenBy.name}
                      </span>
                    </span>
                  </td>
                  <td className="px-2 py-2.5 text-lg whitespace-nowrap tabular-nums">{formatVolts(reading.voltage)}</td>
                  <td className="px-2 py-2.5 text-lg whitespace-nowrap tabular-nums">{formatMilliohm(reading.internalResistanceMilliohm)}</td>
                  <td className="px-2 py-2.5">
                    <ChargeValue reading={reading} />
                  </td>
                  <td className="px-2 py-2.5 whitespace-nowrap">{restWords(reading)}</td>
                  <td className="px-2 py-2.5 whitespace-nowrap tabular-nums">{reading.temperatureC === null ? '–' : `${reading.temperatureC} °C`}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
