import { nextLocalTimeAfter } from '@keybed/shared';
import { notifyLive } from '../../lib/live-events';
import type { Logger } from '../../lib/logger';
import type { TimeRepo } from './time.repo';

export const closeReason = (close: string) => `Still running at the bench-day close (${close}); stopped at that time. Check the real end time.`;

/**
 * The bench-day close sweep: every entry still running past its workshop's first local close
 * time after it started is stopped at that close time and flagged for review. Each entry is
 * closed under its technician's lock, like any clock action; one stopped meanwhile is left alone.
 */
export function createBenchDayClose({ repo, logger }: { repo: TimeRepo; logger: Logger }) {
  return {
    async closeOverdueEntries(now: Date): Promise<{ closed: number }> {
      const running = await repo.runningEverywhere();
      let closed = 0;
      for (const entry of running) {
        const closeAt = nextLocalTimeAfter(entry.startedAt, entry.benchDayClose, entry.timeZone);
        if (closeAt.getTime() > now.getTime()) continue;
        const isClosed = await repo.transaction(async (tx) => {
          await repo.lockTechnician(tx, entry.workshopId, entry.technicianId);
          if (!(await repo.closeForReview(tx, entry.id, closeAt, closeReason(entry.benchDayClose)))) return false;
          await notifyLive(tx, entry.workshopId, 'time.changed', entry.technicianId, now);
          return true;
        });
        if (isClosed) closed += 1;
      }
      if (closed > 0) logger.info({ closed }, 'bench-day close stopped running entries');
      return { closed };
    },
  };
}

export type BenchDayClose = ReturnType<typeof createBenchDayClose>;
