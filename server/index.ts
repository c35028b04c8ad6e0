import { createApp } from './app';
import { loadEnv } from './config/env';
import { createSequelize } from './db/sequelize';
import { migrate } from './db/umzug';
import { logger } from './lib/logger';
import { startOutboxWorker } from './modules/emails/outbox.service';

process.on('unhandledRejection', (reason) => {
  logger.error({ err: reason }, 'unhandled promise rejection');
});
// A genuine bug leaves the process in an unknown state: log it and stop (the supervisor restarts us).
// Database outages never arrive here: every pg pool has an 'error' listener (app.ts; Sequelize keeps
// its own), and requests that meet a lost connection are answered 503 by the error handler.
process.on('uncaughtException', (err) => {
  logger.fatal({ err }, 'uncaught exception; stopping');
  process.exit(1);
});

const env = loadEnv();
const sequelize = createSequelize(env.DATABASE_URL);
const applied = await migrate(sequelize);
if (applied.length) logger.info({ applied }, 'migrations applied');

const { app, close } = createApp({ env, sequelize });
const server = app.listen(env.PORT, env.HOST, () => {
  logger.info(`Crankwise listening on http://${env.HOST}:${env.PORT}`);
});
const stopOutbox = startOutboxWorker({ pollMs: env.OUTBOX_POLL_MS });

// Ctrl-C in a terminal signals the whole process group: `npm start` forwards a SIGTERM while this process
// has its own SIGINT already. Shut down once; a second signal during shutdown is only logged.
let shuttingDown = false;
async function shutdown(signal: string) {
  if (shuttingDown) {
    logger.info({ signal }, 'already shutting down');
    return;
  }
  shuttingDown = true;
  logger.info({ signal }, 'shutting down');
  server.close();
  await stopOutbox();
  await close();
  await sequelize.close();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
