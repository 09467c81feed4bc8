import { createDatabase } from '@keybed/db/client';
import { createApp } from './app';
import { loadConfig } from './config/env';
import { createLogger } from './lib/logger';
import { createSmtpMailer } from './lib/mail';
import { startScheduler } from './lib/scheduler';
import { createBenchDayClose } from './modules/time/bench-day-close';
import { createTimeRepo } from './modules/time/time.repo';

const config = loadConfig();
const logger = createLogger(config.logLevel);
const { db, sql } = createDatabase(config.databaseUrl, { max: config.databasePoolMax });
const mailer = createSmtpMailer(config.smtp);
const app = createApp({ config, db, sql, mailer, logger });

const server = app.listen(config.port, config.host, () => {
  logger.info({ port: config.port, host: config.host }, 'Keybed API listening');
});
const benchDayClose = createBenchDayClose({ repo: createTimeRepo(db), logger });
const scheduler = startScheduler({ databaseUrl: config.databaseUrl, logger, closeOverdueEntries: benchDayClose.closeOverdueEntries });
scheduler.catch((err: unknown) => logger.error({ err }, 'scheduler did not start; running entries are not closed at bench-day close'));

let isStopping = false;
async function stop(signal: string) {
  if (isStopping) return;
  isStopping = true;
  logger.info({ signal }, 'stopping');
  await scheduler.then((s) => s.stop()).catch((err: unknown) => logger.error({ err }, 'scheduler did not stop cleanly'));
  await app.close();
  server.close();
  server.closeAllConnections();
  mailer.close();
  await sql.end({ timeout: 5 });
  process.exit(0);
}
process.on('SIGINT', () => void stop('SIGINT'));
process.on('SIGTERM', () => void stop('SIGTERM'));
