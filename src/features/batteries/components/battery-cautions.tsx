import type { ReactNode } from 'react';
import { AirIcon, DropIcon, GogglesIcon } from '../../../components/ui/safety-icons';

function Caution({ icon, children }: { icon: ReactNode; children: ReactNode }) {
  return (
    <li className="flex items-start gap-2.5">
      <span className="mt-0.5 text-warning">{icon}</span>
      <span className="min-w-0">{children}</span>
    </li>
  );
}

/**
 * The cautions for handling and charging lead-acid batteries (REFERENCES §6), in our own words.
 * Small enough to stay on every screen where batteries are handled, never folded away.
 */
export function BatteryCautions() {
  return (
    <aside aria-labelledby="battery-cautions-title" className="flex flex-col gap-2 rounded-2xl border-2 border-warning bg-surface p-4">
      <h2 id="battery-cautions-title" className="text-lg font-bold">
        Battery safety
      </h2>
      <ul className="grid gap-x-6 gap-y-2 xl:grid-cols-3">
        <Caution icon={<GogglesIcon />}>
          <strong>Eyes covered:</strong> impact-rated safety glasses marked <strong>Z87+</strong> whenever you handle a battery.
        </Caution>
        <Caution icon={<DropIcon />}>
          <strong>Acid in an eye:</strong> rinse with clean water for at least 15 minutes, then get medical help.
        </Caution>
        <Caution icon={<AirIcon />}>
          <strong>Charging gives off hydrogen:</strong> keep the charging spot ventilated; no sparks or flames near it.
        </Caution>
      </ul>
      <p className="text-sm text-ink-muted">Local codes, the event&apos;s rules and the battery maker&apos;s instructions come first.</p>
    </aside>
  );
}
