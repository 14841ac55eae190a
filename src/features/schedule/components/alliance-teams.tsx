import type { Alliance } from '@shared/domain/timeline';
import { AllianceTag, allianceSoftClass } from '../../../components/ui/alliance';

/** One alliance's three team numbers, ours set apart by weight and a frame, not by colour. */
export function AllianceTeams({ alliance, teams, ourNumber }: { alliance: Alliance; teams: readonly number[]; ourNumber: number }) {
  return (
    <div className={`flex items-center gap-2 rounded-xl border-l-4 px-2 py-1 ${allianceSoftClass(alliance)}`}>
      <AllianceTag alliance={alliance} />
      <ul className="flex flex-wrap gap-x-1 text-base tabular-nums sm:gap-x-2 sm:text-lg">
        {teams.map((team, seat) => (
          <li
            key={`${seat}-${team}`}
            className={team === ourNumber ? 'rounded-md px-1 font-extrabold text-ink ring-2 ring-current' : 'px-1 font-semibold'}
          >
            {team}
            {team === ourNumber && <span className="sr-only"> (us)</span>}
          </li>
        ))}
      </ul>
    </div>
  );
}
