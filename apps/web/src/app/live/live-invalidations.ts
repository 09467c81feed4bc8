import type { QueryKey } from '@tanstack/react-query';
import type { LiveEvent } from '@keybed/shared';
import { benchKeys } from '@/features/bench/api/keys';
import { boardKeys } from '@/features/board/api/keys';
import { clientKeys } from '@/features/clients/api/keys';
import { costingKeys } from '@/features/costing/api/keys';
import { estimateKeys } from '@/features/estimates/api/keys';
import { jobKeys } from '@/features/jobs/api/keys';
import { partKeys } from '@/features/parts/api/keys';
import { paymentKeys } from '@/features/payments/api/keys';
import { pianoKeys } from '@/features/pianos/api/keys';
import { settingsKeys } from '@/features/settings/api/keys';
import { stageKeys } from '@/features/stages/api/keys';
import { taskKeys } from '@/features/tasks/api/keys';
import { timesheetKeys } from '@/features/timesheets/api/keys';

/**
 * The narrowest cached reads each live event can have changed. Events carry only a kind and an
 * id, so lists and other records that show a name (a card shows its client's) are included too.
 */
export function keysFor(event: LiveEvent): QueryKey[] {
  switch (event.kind) {
    case 'job.created':
      // Also an accepted job that was waiting for the client: its page now shows it on the board.
      return [boardKeys.all, jobKeys.detail(event.id), jobKeys.lists(), pianoKeys.details()];
    case 'job.updated':
      return [boardKeys.all, jobKeys.detail(event.id), jobKeys.lists(), pianoKeys.details()];
    case 'job.moved':
      return [boardKeys.all, jobKeys.detail(event.id), pianoKeys.details()];
    case 'stage.changed':
    case 'stages.reordered':
      return [stageKeys.all, boardKeys.all, jobKeys.details()];
    case 'client.changed':
      return [clientKeys.detail(event.id), clientKeys.lists(), boardKeys.all, jobKeys.details(), pianoKeys.all];
    case 'piano.changed':
      return [pianoKeys.detail(event.id), pianoKeys.lists(), clientKeys.details(), boardKeys.all, jobKeys.details()];
    case 'task.changed':
      // Cards and the job page list the technicians with open tasks; budgets feed the costing.
      return [taskKeys.list(event.id), boardKeys.all, jobKeys.detail(event.id), costingKeys.job(event.id), costingKeys.reports()];
    case 'time.changed':
      // Logged minutes show on tasks, on the board's cards, in costing and on the margins page; who is on what; the technician's week.
      return [benchKeys.running(), taskKeys.lists(), boardKeys.all, timesheetKeys.all, costingKeys.all];
    case 'estimate.changed':
      return [estimateKeys.list(event.id), costingKeys.job(event.id), costingKeys.reports()];
    case 'part.changed':
      return [partKeys.detail(event.id), partKeys.lists(), partKeys.usedOnTasks()];
    case 'costing.changed':
      // Parts used, a sublet bill, or a payment received on the job.
      return [costingKeys.job(event.id), costingKeys.reports(), paymentKeys.job(event.id)];
    case 'settings.changed':
      return [settingsKeys.all, costingKeys.all];
    default:
      // A kind this build does not know yet: refresh the board, the page most likely open.
      return [boardKeys.all];
  }
}

/** After the stream was down, anything may have changed: refresh every board-related read. */
export const keysAfterReconnect: QueryKey[] = [
  boardKeys.all,
  jobKeys.all,
  stageKeys.all,
  clientKeys.all,
  pianoKeys.all,
  taskKeys.all,
  benchKeys.all,
  timesheetKeys.all,
  estimateKeys.all,
  partKeys.all,
  costingKeys.all,
  paymentKeys.all,
  settingsKeys.all,
];

export const isBoardKey = (key: QueryKey) => key[0] === boardKeys.all[0];
export const boardMoveKey = boardKeys.moves();
