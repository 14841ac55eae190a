import type { BatteryJson } from '@shared/schemas/batteries';
import { QrCode } from '../../../../components/ui/qr-code';

// The label is read across a pit: as big as its length allows. Up to four characters sit beside
// the code; a longer one (e.g. "2027-12") gets the label's full width above it.
const SHORT = 4;
function labelSize(label: string): string {
  if (label.length <= 2) return 'text-[7rem]';
  return label.length <= 7 ? 'text-6xl' : 'text-4xl';
}

/** The address a phone opens from the code: this battery's page, where a reading is logged. */
export const batteryPageUrl = (batteryId: string) => `${window.location.origin}/batteries/${encodeURIComponent(batteryId)}`;

/**
 * One printable label: the battery's label in very large type, our team number, and a QR code
 * of its page. Black on white in every theme, as it will be on paper; never split across pages.
 */
export function BatteryLabel({ battery, teamNumber }: { battery: BatteryJson; teamNumber: number }) {
  const url = batteryPageUrl(battery.id);
  const long = battery.label.length > SHORT;
  return (
    <li
      data-battery-id={battery.id}
      data-url={url}
      className="grid break-inside-avoid grid-cols-[1fr_auto] items-center gap-x-4 gap-y-2 rounded-xl border-2 border-dashed border-black bg-white p-4 text-black print:rounded-none"
    >
      <p className="col-span-2 text-base font-bold tracking-widest uppercase">
        Team <span className="tabular-nums">{teamNumber}</span>
        {battery.status === 'retired' && ' · Retired'}
      </p>
      {/* Breaks inside a word only when nothing else fits (a twelve-character label on a phone). */}
      <p className={`leading-none font-black tracking-tight [overflow-wrap:anywhere] ${labelSize(battery.label)} ${long ? 'col-span-2' : ''}`}>
        <span className="sr-only">Battery </span>
        {battery.label}
      </p>
      {long && <p className="text-sm">Scan to open its page and log a reading</p>}
      <QrCode value={url} label={`QR code to the page of battery ${battery.label}`} className={`size-36 ${long ? '' : 'row-span-2'}`} />
      {!long && <p className="self-start text-sm">Scan to open its page and log a reading</p>}
    </li>
  );
}
