import type supertest from 'supertest';
import { CatalogueOperation, type CreateCatalogueOperationInput } from '@keybed/shared';
import { createPart, SCENARIO_PARTS } from './money-fixtures';

export async function addOperation(agent: supertest.Agent, input: CreateCatalogueOperationInput | Record<string, unknown>) {
  const res = await agent.post('/api/catalogue').send(input);
  if (res.status !== 201) throw new Error(`POST /api/catalogue answered ${res.status}: ${JSON.stringify(res.body)}`);
  return CatalogueOperation.parse(res.body);
}

/**
 * Part of the scenario's work catalogue on a workshop with the scenario's settings: the grand's
 * hammers (new or recovered), rebushing, regulation, and the case (revive the shellac, or the
 * black polyester refinish sublet to Heathside Finishers). Hours are demo defaults (TRADE.md §4).
 */
export async function scenarioCatalogue(owner: supertest.Agent) {
  const hammers = await createPart(owner, SCENARIO_PARTS.grandHammers);
  const cloth = await createPart(owner, SCENARIO_PARTS.bushingCloth);
  const shellac = await createPart(owner, SCENARIO_PARTS.shellac);
  const newHammers = await addOperation(owner, {
    name: 'Replace hammer set (grand)',
    pianoType: 'grand',
    componentKeys: ['hammers'],
    lines: [
      { kind: 'labour', description: 'Hang and shape new hammers', minutes: 600 },
      { kind: 'part', partId: hammers.id, quantityMilli: 1000 },
    ],
  });
  const recover = await addOperation(owner, {
    name: 'Recover the old hammers',
    pianoType: 'grand',
    componentKeys: ['hammers'],
    lines: [{ kind: 'sublet', description: 'Hammer recovering', supplier: 'Larkspur Felts', unitPriceMinor: 42000, unitCostMinor: 30000 }],
  });
  const rebush = await addOperation(owner, {
    name: 'Rebush keys',
    componentKeys: ['key-bushings'],
    lines: [
      { kind: 'labour', description: 'Rebush keys', minutes: 360 },
      { kind: 'part', partId: cloth.id, quantityMilli: 2500 },
    ],
  });
  const regulation = await addOperation(owner, { name: 'Full regulation', componentKeys: ['regulation', 'hammers'], lines: [{ kind: 'labour', description: 'Full regulation', minutes: 600 }] });
  const revive = await addOperation(owner, {
    name: 'Case tidy: revive the shellac',
    componentKeys: ['case-finish'],
    lines: [
      { kind: 'labour', description: 'Clean and revive the shellac', minutes: 480 },
      { kind: 'part', partId: shellac.id, quantityMilli: 500 },
    ],
  });
  const refinish = await addOperation(owner, {
    name: 'Full refinish in black polyester',
    componentKeys: ['case-finish'],
    lines: [{ kind: 'sublet', description: 'Black polyester refinish', supplier: 'Heathside Finishers', unitPriceMinor: 185000, unitCostMinor: 145000 }],
  });
  return { newHammers, recover, rebush, regulation, revive, refinish, parts: { hammers, cloth, shellac } };
}
