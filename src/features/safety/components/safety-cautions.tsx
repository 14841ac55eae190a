import type { ReactNode } from 'react';
import { FirstThingsFirst } from '../../../components/ui/first-things-first';
import { AirIcon, DropIcon, GogglesIcon } from '../../../components/ui/safety-icons';

function Caution({ icon, children }: { icon: ReactNode; children: ReactNode }) {
  return (
    <li className="flex items-start gap-3">
      <span className="mt-0.5 text-warning">{icon}</span>
      <span className="min-w-0">{children}</span>
    </li>
  );
}

/** The cautions of the pit (REFERENCES §6), in our own words, on every safety page that is not a form. */
export function SafetyCautions() {
  return (
    <aside aria-labelledby="safety-cautions-title" className="flex flex-col gap-3 rounded-2xl border-2 border-warning bg-surface p-4 sm:p-5">
      <h2 id="safety-cautions-title" className="text-xl font-bold">
        Pit safety
      </h2>
      <ul className="flex flex-col gap-3 text-lg">
        <Caution icon={<GogglesIcon className="size-7" />}>
          <strong>Eyes covered in the pit:</strong> impact-rated safety glasses marked <strong>Z87+</strong>.
        </Caution>
        <Caution icon={<DropIcon className="size-7" />}>
          <strong>Battery acid in an eye:</strong> flush with clean water for at least 15 minutes, then get medical help.
        </Caution>
        <Caution icon={<AirIcon className="size-7" />}>
          <strong>Charging gives off hydrogen:</strong> keep the charging spot ventilated; no sparks or flames near charging batteries.
        </Caution>
      </ul>
      <FirstThingsFirst />
    </aside>
  );
}
