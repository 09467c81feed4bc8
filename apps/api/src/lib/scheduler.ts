import PgBoss from 'pg-boss';
import type { Logger } from './logger';

/** The bench-day close sweep's queue and schedule: every 5 minutes, in UTC. */
export const BENCH_DAY_CLOSE_QUEUE = 'bench-day-close';
export const BENCH_DAY_CLOSE_CRON = '*/5 * * * *';

/** PostgreSQL SQLSTATEs two processes setting up the same queue at once can meet: deadlock, unique violation. */
const RACE_CODES = new Set(['40P01', '23505']);

/** Runs a set-up step again (up to 5 times, after a short random pause) when another process raced it. */
async function retryWhenRacing<T>(step: () => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await step();
    } catch (err) {
      const code = (err as { code?: unknown }).code;
      if (attempt >= 5 || typeof code !== 'string' || !RACE_CODES.has(code)) throw err;
      await new Promise((resolve) => setTimeout(resolve, 50 * attempt + Math.random() * 100));
    }
  }
}

export interface SchedulerDeps {
  databaseUrl: string;
  logger: Logger;
  /** The sweep, given the moment it runs. */
  closeOverdueEntries: (now: Date) => Promise<{ closed: number }>;
  now?: () => Date;
}

/**
 * Scheduled jobs through pg-boss (its tables live in the `pgboss` schema of our database). pg-boss
 * puts one job in the queue per schedule slot whichever process's clock monitor sees it first,
 * and a job is fetched by exactly one worker (SELECT … FOR UPDATE SKIP LOCKED), so the sweep runs
 * once per slot however many API processes run. The queue's singleton policy keeps a slow sweep
 * from overlapping the next one.
 */
export async function startScheduler({ databaseUrl, logger, closeOverdueEntries, now = () => new Date() }: SchedulerDeps) {
  const boss = new PgBoss({ connectionString: databaseUrl, schema: 'pgboss', max: 2, application_name: 'keybed-scheduler' });
  boss.on('error', (err: unknown) => logger.error({ err }, 'scheduler error'));
  await boss.start();
  await retryWhenRacing(async () => {
    if (await boss.getQueue(BENCH_DAY_CLOSE_QUEUE)) return;
    await boss.createQueue(BENCH_DAY_CLOSE_QUEUE, { name: BENCH_DAY_CLOSE_QUEUE, policy: 'singleton', retryLimit: 2, expireInSeconds: 240 });
  });
  await retryWhenRacing(() => boss.schedule(BENCH_DAY_CLOSE_QUEUE, BENCH_DAY_CLOSE_CRON, {}, { tz: 'UTC' }));
  await boss.work(BENCH_DAY_CLOSE_QUEUE, async (jobs) => {
    for (const _job of jobs) await closeOverdueEntries(now());
  });
  logger.info({ queue: BENCH_DAY_CLOSE_QUEUE, cron: BENCH_DAY_CLOSE_CRON }, 'scheduler started');
  return {
    boss,
    /** Lets a running sweep finish (up to 10 s), then closes pg-boss's connections. */
    stop: () => boss.stop({ graceful: true, timeout: 10_000 }),
  };
}

export type Scheduler = Awaited<ReturnType<typeof startScheduler>>;
