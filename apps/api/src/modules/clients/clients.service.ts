import type { Client, ClientDetail, ClientListQuery, CreateClientInput, UpdateClientInput } from '@keybed/shared';
import { notFound } from '../../http/errors';
import { committed, notifyLive, type Changed } from '../../lib/live-events';
import type { PianosService } from '../pianos/pianos.service';
import type { ClientRow, ClientsRepo } from './clients.repo';

interface Deps {
  repo: ClientsRepo;
  pianos: Pick<PianosService, 'list'>;
  now: () => Date;
  changed: Changed;
}

export const toClient = (c: ClientRow): Client => ({
  id: c.id,
  name: c.name,
  email: c.email,
  phone: c.phone,
  address: c.address,
  notes: c.notes,
  createdAt: c.createdAt.toISOString(),
  updatedAt: c.updatedAt.toISOString(),
});

export function createClientsService({ repo, pianos, now, changed }: Deps) {
  return {
    list: async (workshopId: string, query: ClientListQuery) => (await repo.list(workshopId, query)).map(toClient),

    async get(workshopId: string, id: string): Promise<ClientDetail> {
      const client = await repo.find(workshopId, id);
      if (!client) throw notFound('That client');
      return { ...toClient(client), pianos: await pianos.list(workshopId, { clientId: id, limit: 200 }) };
    },

    create: (workshopId: string, input: CreateClientInput) =>
      committed(
        changed,
        workshopId,
        repo.transaction(async (tx) => {
          const row = await repo.insert(tx, workshopId, { ...input, notes: input.notes ?? '' });
          await notifyLive(tx, workshopId, 'client.changed', row.id, now());
          return toClient(row);
        }),
      ),

    update: (workshopId: string, id: string, input: UpdateClientInput) =>
      committed(
        changed,
        workshopId,
        repo.transaction(async (tx) => {
          const at = now();
          const row = await repo.update(tx, workshopId, id, input, at);
          if (!row) throw notFound('That client');
          await notifyLive(tx, workshopId, 'client.changed', row.id, at);
          return toClient(row);
        }),
      ),
  };
}

export type ClientsService = ReturnType<typeof createClientsService>;
