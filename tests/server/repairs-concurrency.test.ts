import { describe, expect, it } from 'vitest';
import type { RepairJson } from '../../shared/schemas/repairs';
import { signIn, testApp } from '../support/app';
import { statusesOf } from '../support/batteries';
import { makeTeam, PASSWORD } from '../support/factories';
import { addPhoto, boardOf, columnOf, editRepair, makeImage, makeRepair, uploadPhoto } from '../support/repairs';

// Tablets writing the same board at once: writes of one team queue behind its row, so each one
// sees what the one before it wrote.
const { app } = testApp();

async function twoTablets() {
  const own = await makeTeam();
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  return { ...own, lead, crew };
}

describe('two people moving the same card at once', () => {
  it('with the same version: exactly one wins (200), the other gets 409 stale with the winner\'s card; nothing is lost silently', async () => {
    const own = await twoTablets();
    for (let round = 0; round < 5; round++) {
      const card = await makeRepair(own.crew, own.event.id, { title: `Card ${round}` });
      const [byLead, byCrew] = await Promise.all([
        own.lead.patch(`/api/repairs/${card.id}`, { version: 0, status: 'in_progress' }),
        own.crew.patch(`/api/repairs/${card.id}`, { version: 0, status: 'needs_test', title: `Card ${round} (crew)` }),
      ]);
      expect(statusesOf([byLead, byCrew])).toEqual([200, 409]);
      const [winner, loser] = byLead.status === 200 ? [byLead, byCrew] : [byCrew, byLead];
      expect(loser.body.error).toMatchObject({ code: 'stale', current: winner.body });
      const reread = (await own.lead.get(`/api/repairs/${card.id}`)).body;
      expect(reread).toMatchObject({ status: (winner.body as RepairJson).status, title: (winner.body as RepairJson).title, version: 1 });
      expect(reread.history.map((row: { kind: string }) => row.kind).filter((kind: string) => kind === 'moved')).toHaveLength(1);
    }
  });

  it('two cards dropped into the same gap at once both land there, with keys of their own', async () => {
    const own = await twoTablets();
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    const top = await makeRepair(own.crew, own.event.id, { title: 'Top', severity: 'blocks_match' });
    const bottom = await makeRepair(own.crew, own.event.id, { title: 'Bottom', severity: 'cosmetic' });
    const x = await makeRepair(own.crew, own.event.id, { title: 'X', severity: 'degraded' });
    const y = await makeRepair(own.crew, own.event.id, { title: 'Y', severity: 'degraded' });
    await editRepair(own.crew, x, { status: 'in_progress' });
    await editRepair(own.crew, y, { status: 'in_progress' });
    const answers = await Promise.all([
      own.lead.patch(`/api/repairs/${x.id}`, { version: 1, status: 'reported', afterId: top.id, beforeId: bottom.id }),
      admin.patch(`/api/repairs/${y.id}`, { version: 1, status: 'reported', afterId: top.id, beforeId: bottom.id }),
    ]);
    expect(statusesOf(answers)).toEqual([200, 200]);
    const board = await boardOf(own.lead, own.event.id);
    const column = columnOf(board, 'reported');
    expect(column[0]).toBe('Top');
    expect(column.at(-1)).toBe('Bottom');
    expect([...column.slice(1, 3)].sort()).toEqual(['X', 'Y']);
    expect(new Set(board.repairs.map((repair) => repair.orderKey)).size).toBe(4);
  });

  it('reports made at once get keys of their own, in urgency order', async () => {
    const own = await twoTablets();
    const severities = ['cosmetic', 'blocks_match', 'degraded', 'cosmetic', 'blocks_match', 'degraded', 'degraded', 'cosmetic'];
    await Promise.all(severities.map((severity, index) => makeRepair(index % 2 ? own.lead : own.crew, own.event.id, { title: `R${index}`, severity })));
    const board = await boardOf(own.lead, own.event.id);
    expect(new Set(board.repairs.map((repair) => repair.orderKey)).size).toBe(severities.length);
    expect(board.repairs.map((repair) => repair.severity)).toEqual([...severities].sort((a, b) => ['blocks_match', 'degraded', 'cosmetic'].indexOf(a) - ['blocks_match', 'degraded', 'cosmetic'].indexOf(b)));
  });

  it('two uploads of the 6th photo at once: one is taken, the other answers 409 too_many_photos', async () => {
    const own = await twoTablets();
    const card = await makeRepair(own.crew, own.event.id);
    const image = await makeImage({ width: 16, height: 16 });
    for (let count = 0; count < 5; count++) await addPhoto(own.crew, card.id, image);
    const answers = await Promise.all([uploadPhoto(own.crew, card.id, image), uploadPhoto(own.lead, card.id, image)]);
    expect(statusesOf(answers)).toEqual([201, 409]);
    expect((await own.lead.get(`/api/repairs/${card.id}`)).body.photos).toHaveLength(6);
  });
});
