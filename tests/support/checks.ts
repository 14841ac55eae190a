import { expect } from 'vitest';
import type { RunJson, TemplateJson } from '../../shared/schemas/checks';
import type { SignedIn } from './app';
import { matchBody } from './schedule';

/** One item of a template body as a client sends it; override any field. */
export const tick = (label: string, overrides: Record<string, unknown> = {}) => ({ label, kind: 'tick', required: true, ...overrides });

/** A pre-match template body with one item of each kind, a bumper item and an optional one. */
export const preMatchBody = (overrides: Record<string, unknown> = {}) => ({
  name: 'Before every match',
  phase: 'pre_match',
  items: [
    { label: 'Bumpers match our alliance', kind: 'choice', required: true, options: ['Red', 'Blue'], purpose: 'bumper_colour' },
    tick('Battery latched and strapped', { help: 'Pull it: nothing moves', role: 'battery' }),
    { label: 'Stored air pressure', kind: 'number', required: true, min: 100, max: 120, unit: 'psi' },
    { label: 'Code version on the robot', kind: 'text', required: true },
    tick('Wipe the camera lens', { required: false }),
  ],
  ...overrides,
});

/** Creates a template through the API (as an admin or lead) and answers it. */
export async function makeTemplate(client: SignedIn, body: Record<string, unknown> = preMatchBody()) {
  const answer = await client.post('/api/checklist-templates', body);
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as TemplateJson;
}

/** Adds a match with our team on the given alliance (red by default) through the API. */
export async function makeOurMatch(
  client: SignedIn,
  event: { id: string; teamNumber: number },
  { number = 1, alliance = 'red', scheduledStart = '2026-12-05T09:00:00.000Z' }: { number?: number; alliance?: 'red' | 'blue'; scheduledStart?: string } = {},
) {
  const us = event.teamNumber;
  const seats = alliance === 'red' ? { red: [us, 21002, 21003] } : { blue: [21004, us, 21006] };
  const answer = await client.post(`/api/events/${event.id}/matches`, matchBody({ number, scheduledStart, ...seats }));
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as { id: string; number: number };
}

/** Starts a run through the API and answers it. */
export async function makeRun(client: SignedIn, eventId: string, templateId: string, matchId: string | null = null) {
  const answer = await client.post(`/api/events/${eventId}/checklist-runs`, { templateId, matchId });
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as RunJson;
}

/** The id of the run item with this label. */
export const itemId = (run: { items: { id: string; label: string }[] }, label: string) => {
  const item = run.items.find((candidate) => candidate.label === label);
  if (!item) throw new Error(`No item labelled ${label}`);
  return item.id;
};
