import { expect } from 'vitest';
import type { BatteryJson, ChargerJson, ChargingSessionJson, CreatedReadingJson, UseJson } from '../../shared/schemas/batteries';
import type { SignedIn } from './app';

/** A valid body for POST /api/batteries; override any field. */
export const batteryBody = (overrides: Record<string, unknown> = {}) => ({ label: 'A', yearInService: 2025, ...overrides });

/** A rested reading of a full, healthy battery (12.70 V, 12 mΩ); override any field. */
export const readingBody = (overrides: Record<string, unknown> = {}) => ({
  voltage: 12.7,
  internalResistanceMilliohm: 12,
  rested: true,
  restedMinutes: 300,
  ...overrides,
});

/** A valid body for POST /api/chargers; override any field. */
export const chargerBody = (overrides: Record<string, unknown> = {}) => ({ name: 'Bench charger', bays: 2, currentPerBayA: 6, ...overrides });

/** Adds a battery through the API (as admin or battery handler) and answers it. */
export async function makeBattery(client: SignedIn, overrides: Record<string, unknown> = {}) {
  const answer = await client.post('/api/batteries', batteryBody(overrides));
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as BatteryJson;
}

/** Logs a reading through the API and answers it. */
export async function logReading(client: SignedIn, batteryId: string, overrides: Record<string, unknown> = {}) {
  const answer = await client.post(`/api/batteries/${batteryId}/readings`, readingBody(overrides));
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as CreatedReadingJson;
}

/** Adds a charger through the API and answers it. */
export async function makeCharger(client: SignedIn, overrides: Record<string, unknown> = {}) {
  const answer = await client.post('/api/chargers', chargerBody(overrides));
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as ChargerJson;
}

/** Installs the battery for a match through the API and answers the use. */
export async function install(client: SignedIn, batteryId: string, matchId: string) {
  const answer = await client.post(`/api/batteries/${batteryId}/uses`, { matchId });
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as UseJson;
}

/** Puts the battery on a charger bay through the API and answers the session. */
export async function startCharging(client: SignedIn, batteryId: string, chargerId: string, bay = 1) {
  const answer = await client.post(`/api/batteries/${batteryId}/charging`, { chargerId, bay });
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as ChargingSessionJson;
}

/** Every answer's HTTP status, sorted: for races where either request may win. */
export const statusesOf = (answers: readonly { status: number }[]) => answers.map((answer) => answer.status).sort();
