import type { CreatePianoInput, Piano, PianoDetail, PianoListQuery, UpdatePianoInput } from '@keybed/shared';
import { notFound } from '../../http/errors';
import { committed, notifyLive, type Changed } from '../../lib/live-events';
import type { PianoRow, PianosRepo } from './pianos.repo';

interface Deps {
  repo: PianosRepo;
  now: () => Date;
  changed: Changed;
}

export const toPiano = (p: PianoRow): Piano => ({
  id: p.id,
  clientId: p.clientId,
  clientName: p.clientName,
  maker: p.maker,
  model: p.model,
  serialNumber: p.serialNumber,
  type: p.type,
  sizeMm: p.sizeMm,
  yearApprox: p.yearApprox,
  caseFinish: p.caseFinish,
  keytopMaterial: p.keytopMaterial,
  notes: p.notes,
  createdAt: p.createdAt.toISOString(),
  updatedAt: p.updatedAt.toISOString(),
});

const clientNotFound = () => notFound('That client');

export function createPianosService({ repo, now, changed }: Deps) {
  return {
    list: async (workshopId: string, query: Pick<PianoListQuery, 'q' | 'clientId' | 'limit'>) =>
      (await repo.list(workshopId, query)).map(toPiano),

    async get(workshopId: string, id: string): Promise<PianoDetail> {
      const piano = await repo.find(workshopId, id);
      if (!piano) throw notFound('That piano');
      const jobs = await repo.jobHistory(workshopId, id);
      return {
        ...toPiano(piano),
        jobs: jobs.map((j) => ({ ...j, createdAt: j.createdAt.toISOString(), updatedAt: j.updatedAt.toISOString() })),
      };
    },

    /** The owner must be a client of the same workshop; another workshop's client answers 404. */
    create: (workshopId: string, input: CreatePianoInput) =>
      committed(
        changed,
        workshopId,
        repo.transaction(async (tx) => {
          if (!(await repo.clientExists(tx, workshopId, input.clientId))) throw clientNotFound();
          const id = await repo.insert(tx, workshopId, input);
          await notifyLive(tx, workshopId, 'piano.changed', id, now());
          return toPiano((await repo.find(workshopId, id, tx))!);
        }),
      ),

    update: (workshopId: string, id: string, input: UpdatePianoInput) =>
      committed(
        changed,
        workshopId,
        repo.transaction(async (tx) => {
          if (input.clientId && !(await repo.clientExists(tx, workshopId, input.clientId))) throw clientNotFound();
          const at = now();
          if (!(await repo.update(tx, workshopId, id, input, at))) throw notFound('That piano');
          await notifyLive(tx, workshopId, 'piano.changed', id, at);
          return toPiano((await repo.find(workshopId, id, tx))!);
        }),
      ),
  };
}

export type PianosService = ReturnType<typeof createPianosService>;
