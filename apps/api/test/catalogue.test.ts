import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CatalogueList, CatalogueOperation } from '@keybed/shared';
import { addOperation, scenarioCatalogue } from './catalogue-fixtures';
import { createTestApp, type TestApp } from './helpers';
import { createPart, moneyWorkshop, SCENARIO_PARTS } from './money-fixtures';
import { ErrorBody } from './schemas';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('POST /api/catalogue', () => {
  it('when the owner adds the grand hammer operation, then its lines are priced at the charge-out rate and the part’s sell price', async () => {
    const w = await moneyWorkshop(t);
    const { newHammers } = await scenarioCatalogue(w.owner.agent);
    expect(newHammers).toMatchObject({ name: 'Replace hammer set (grand)', pianoType: 'grand', componentKeys: ['hammers'], labourMinutes: 600, netMinor: 55000 + 69000 });
    expect(newHammers.lines.map((l) => [l.kind, l.amountMinor, l.unitCostMinor])).toEqual([
      ['labour', 55000, null],
      ['part', 69000, 52000],
    ]);
  });

  it('when a part is not the workshop’s, or a labour line has no minutes, then 400 and nothing is saved', async () => {
    const w = await moneyWorkshop(t);
    const other = await moneyWorkshop(t);
    const theirPart = await createPart(other.owner.agent, SCENARIO_PARTS.tuningPins);
    const res = await w.owner.agent.post('/api/catalogue').send({ name: 'Restring', lines: [{ kind: 'part', partId: theirPart.id, quantityMilli: 1000 }] }).expect(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(['lines.0.partId']);
    await w.owner.agent.post('/api/catalogue').send({ name: 'Restring', lines: [{ kind: 'labour', description: 'Restring' }] }).expect(400);
    expect((await t.sql`select count(*)::int as n from catalogue_operations where workshop_id = ${w.workshopId}`)[0]!.n).toBe(0);
  });

  it('when the database is given a labour line without minutes, then its check refuses it', async () => {
    const w = await moneyWorkshop(t);
    const op = await addOperation(w.owner.agent, { name: 'Pitch raise and fine tuning', componentKeys: ['tuning-pitch'], lines: [{ kind: 'labour', description: 'Pitch raise', minutes: 120 }] });
    await expect(t.sql`insert into catalogue_lines (workshop_id, operation_id, position, kind, description) values (${w.workshopId}, ${op.id}, 5, 'labour', 'No minutes')`).rejects.toThrow(/catalogue_lines_kind_rules/);
  });

  it('when a technician adds an operation, then 403; they read the catalogue without money', async () => {
    const w = await moneyWorkshop(t);
    await scenarioCatalogue(w.owner.agent);
    await w.priya.agent.post('/api/catalogue').send({ name: 'Case tidy', lines: [{ kind: 'labour', description: 'Tidy', minutes: 60 }] }).expect(403);
    const list = CatalogueList.parse((await w.priya.agent.get('/api/catalogue?pianoType=upright').expect(200)).body);
    expect(list.operations.map((o) => o.name)).toEqual(['Case tidy: revive the shellac', 'Full refinish in black polyester', 'Full regulation', 'Rebush keys']);
    expect(JSON.stringify(list)).not.toMatch(/Minor/);
  });
});

describe('PATCH /api/catalogue/:id', () => {
  it('when the foreman changes the hours and the lines, then the new version comes back; a stale version gets 409; another workshop’s id 404', async () => {
    const w = await moneyWorkshop(t);
    const other = await moneyWorkshop(t);
    const op = await addOperation(w.owner.agent, { name: 'Full regulation', lines: [{ kind: 'labour', description: 'Full regulation', minutes: 600 }] });
    const res = CatalogueOperation.parse((await w.foreman.agent.patch(`/api/catalogue/${op.id}`).send({ version: 1, lines: [{ kind: 'labour', description: 'Full regulation', minutes: 660 }] }).expect(200)).body);
    expect(res).toMatchObject({ version: 2, labourMinutes: 660, netMinor: 60500 });
    expect(res).not.toHaveProperty(['lines', 0, 'unitCostMinor']);
    expect(ErrorBody.parse((await w.foreman.agent.patch(`/api/catalogue/${op.id}`).send({ version: 1, isActive: false }).expect(409)).body).error.code).toBe('version_conflict');
    await other.owner.agent.patch(`/api/catalogue/${op.id}`).send({ version: 2, isActive: false }).expect(404);
  });
});
