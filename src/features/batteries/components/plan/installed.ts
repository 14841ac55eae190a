import { useQueries } from '@tanstack/react-query';
import type { BatteryJson, UseJson } from '@shared/schemas/batteries';
import { batteryQueryOptions } from '../../api/get-battery';

export interface Installed {
  battery: BatteryJson;
  /** Its open use: which match it went in for, and the id "Out of the robot" ends. */
  use: UseJson;
}

/**
 * The batteries in the robot now, each with its open use. The list answer says only `in_robot`;
 * the use (match and id) is on the battery's own page, fetched for those few batteries alone.
 */
export function useInstalled(batteries: readonly BatteryJson[] | undefined): Installed[] {
  const inRobot = (batteries ?? []).filter((battery) => battery.status === 'in_robot');
  const details = useQueries({ queries: inRobot.map((battery) => batteryQueryOptions(battery.id)) });
  return inRobot.flatMap((battery, index) => {
    const use = details[index]?.data?.uses.find((candidate) => candidate.removedAt === null);
    return use ? [{ battery, use }] : [];
  });
}
