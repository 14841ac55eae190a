import type { Transaction } from 'sequelize';
import { healthOf, isReliableRest, type BatterySettings } from '../../shared/domain/battery-state';
import type {
  BatteryDetailJson,
  BatteryJson,
  ChargerJson,
  ChargingSessionJson,
  PersonRef,
  ReadingJson,
  UseJson,
} from '../../shared/schemas/batteries';
import { onePlace } from '../batteries/charge-estimate';
import { chargeOf, fleetDraw } from '../batteries/fleet-charge';
import { fleetRecords, type FleetRecords } from '../batteries/fleet-records';
import { settingsOf, socIn } from '../batteries/settings';
import { Battery, Event, Team, User, type BatteryReading, type BatteryUse, type Charger, type ChargingSession } from '../models';

type People = Map<string, PersonRef>;

/** Names of the people behind these ids, in one query. */
async function peopleOf(ids: Iterable<string>, transaction?: Transaction): Promise<People> {
  const wanted = [...new Set(ids)];
  if (wanted.length === 0) return new Map();
  const users = await User.findAll({ where: { id: wanted }, attributes: ['id', 'name'], transaction });
  return new Map(users.map((user) => [user.id, { id: user.id, name: user.name }]));
}

export function presentReading(reading: BatteryReading, people: People, settings: BatterySettings): ReadingJson {
  return {
    id: reading.id,
    batteryId: reading.batteryId,
    voltage: reading.voltage,
    internalResistanceMilliohm: reading.internalResistanceMilliohm,
    rested: reading.rested,
    restedMinutes: reading.restedMinutes,
    temperatureC: reading.temperatureC,
    takenAt: reading.takenAt.toISOString(),
    // Users are never deleted while their readings exist (the foreign key refuses).
    takenBy: people.get(reading.takenById)!,
    useId: reading.useId,
    stateOfChargePercent: onePlace(socIn(settings)(reading.voltage)),
    reliable: isReliableRest(reading.rested, reading.restedMinutes),
  };
}

export const presentUse = (use: BatteryUse): UseJson => ({
  id: use.id,
  batteryId: use.batteryId,
  matchId: use.matchId,
  installedAt: use.installedAt.toISOString(),
  removedAt: use.removedAt ? use.removedAt.toISOString() : null,
});

export const presentCharger = (charger: Charger): ChargerJson => ({
  id: charger.id,
  name: charger.name,
  bays: charger.bays,
  currentPerBayA: charger.currentPerBayA,
});

export const presentChargingSession = (session: ChargingSession): ChargingSessionJson => ({
  id: session.id,
  batteryId: session.batteryId,
  chargerId: session.chargerId,
  bay: session.bay,
  startedAt: session.startedAt.toISOString(),
  endedAt: session.endedAt ? session.endedAt.toISOString() : null,
  expectedEndAt: session.expectedEndAt ? session.expectedEndAt.toISOString() : null,
});

/** Health from the battery's resistance readings, oldest first, against the team's thresholds. */
export const healthOfReadings = (readings: readonly BatteryReading[], settings: BatterySettings) =>
  healthOf(
    readings.map((reading) => reading.internalResistanceMilliohm),
    settings,
  );

interface Context {
  settings: BatterySettings;
  currentEventId: string | null;
  records: FleetRecords;
  people: People;
  /** The moment the estimates are for, and one match's draw at the current event. */
  now: Date;
  drawPercent: number;
}

function present(battery: Battery, { settings, currentEventId, records, people, now, drawPercent }: Context): BatteryJson {
  const readings = records.readingsOf(battery.id);
  const uses = records.usesOf(battery.id);
  const latest = readings.at(-1);
  const lastUse = uses.at(-1);
  const openSession = records.sessionsOf(battery.id).find((session) => session.endedAt === null);
  return {
    id: battery.id,
    label: battery.label,
    yearInService: battery.yearInService,
    nominalCapacityAh: battery.nominalCapacityAh,
    chemistry: battery.chemistry,
    notes: battery.notes,
    status: battery.status,
    health: healthOfReadings(readings, settings),
    latestReading: latest ? presentReading(latest, people, settings) : null,
    estimatedChargePercent: chargeOf(battery, records, { at: now, drawPercent, settings }),
    // When it last came out of the robot, or went in while it is still there.
    lastUsedAt: lastUse ? (lastUse.removedAt ?? lastUse.installedAt).toISOString() : null,
    usesThisEvent: currentEventId === null ? 0 : uses.filter((use) => use.eventId === currentEventId).length,
    charging: openSession ? presentChargingSession(openSession) : null,
    version: battery.version,
  };
}

/**
 * Batteries of one team with their health, latest reading, estimated charge and charging, in a
 * handful of queries. The draw is the whole fleet's at the current event, as the plan and
 * readiness compute it, so a battery shown alone has the same estimate as in the list.
 */
async function contextOf(batteries: readonly Battery[], { allReadings }: { allReadings: boolean }, transaction?: Transaction): Promise<Context> {
  const now = new Date();
  const teamId = batteries[0].teamId;
  const settings = await settingsOf(teamId, transaction);
  const team = await Team.findByPk(teamId, { attributes: ['id', 'currentEventId'], transaction, rejectOnEmpty: true });
  const fleet = await Battery.findAll({ where: { teamId }, transaction });
  const records = await fleetRecords(
    fleet.map((battery) => battery.id),
    transaction,
  );
  const event = team.currentEventId ? await Event.findByPk(team.currentEventId, { transaction }) : null;
  const { percent: drawPercent } = fleetDraw({ batteries: fleet, records, event, settings });
  const shown = batteries.flatMap((battery) => (allReadings ? records.readingsOf(battery.id) : records.readingsOf(battery.id).slice(-1)));
  const people = await peopleOf(
    shown.map((reading) => reading.takenById),
    transaction,
  );
  return { settings, currentEventId: team.currentEventId, records, people, now, drawPercent };
}

export async function presentBatteries(batteries: readonly Battery[], transaction?: Transaction): Promise<BatteryJson[]> {
  if (batteries.length === 0) return [];
  const context = await contextOf(batteries, { allReadings: false }, transaction);
  return batteries.map((battery) => present(battery, context));
}

export const presentBattery = async (battery: Battery, transaction?: Transaction) => (await presentBatteries([battery], transaction))[0];

/** The battery with every reading and use, oldest first. */
export async function presentBatteryDetail(battery: Battery, transaction?: Transaction): Promise<BatteryDetailJson> {
  const context = await contextOf([battery], { allReadings: true }, transaction);
  return {
    ...present(battery, context),
    readings: context.records.readingsOf(battery.id).map((reading) => presentReading(reading, context.people, context.settings)),
    uses: context.records.usesOf(battery.id).map(presentUse),
  };
}
