import { Button } from '../../../../components/ui/button';
import { TakeOutIcon } from '../../../../components/ui/action-icons';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { useCan } from '../../../../lib/authorization';
import { useEndUse } from '../../api/end-use';
import type { Installed } from './installed';

function InRobotRow({ installed, matchLabel }: { installed: Installed; matchLabel: string }) {
  const canSwap = useCan('batteries:swap');
  const end = useEndUse();
  const { battery, use } = installed;
  return (
    <li className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-xl">
          <span className="font-extrabold">Battery {battery.label}</span> is in the robot for {matchLabel}
        </p>
        {canSwap && (
          <Button variant="secondary" icon={<TakeOutIcon />} pending={end.isPending} onClick={() => end.mutate(use.id)}>
            Out of the robot<span className="sr-only"> (battery {battery.label})</span>
          </Button>
        )}
      </div>
      {end.isError && <ErrorNotice title={`Battery ${battery.label} is still marked as in the robot`} error={end.error} />}
    </li>
  );
}

/** What is in the robot now; taking it out marks it spent, ready to go on a charger. */
export function InRobot({ installed, matchLabelOf }: { installed: Installed[]; matchLabelOf: (matchId: string) => string }) {
  if (installed.length === 0) return null;
  return (
    <ul aria-label="In the robot" className="flex flex-col gap-3 rounded-2xl border-2 border-ok bg-ok-soft p-4">
      {installed.map((entry) => (
        <InRobotRow key={entry.use.id} installed={entry} matchLabel={matchLabelOf(entry.use.matchId)} />
      ))}
    </ul>
  );
}
