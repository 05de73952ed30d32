import { loadConfig } from '../services/common/src/config.js';
import { DEMO_PASSWORD, DEMO_USERS } from '../services/records/src/seed/demo-data.js';
import { buildWeb } from './build-web.js';
import { prepareDatabase } from './lib/database.js';
import { startAll } from './lib/processes.js';
import { localSecrets } from './lib/secrets.js';

/** `npm start`: build what is missing, migrate and seed, start every process, stop them all on Ctrl-C. */
const baseConfig = loadConfig();
const env = { ...process.env, ...localSecrets(baseConfig.dataDir, process.env) };
const config = loadConfig(env);

buildWeb();
const { applied, seeded } = await prepareDatabase(config.databaseUrl, { seed: true });
if (applied.length) console.log(`Migrations applied: ${applied.join(', ')}`);
if (seeded) console.log('Demo data seeded.');

const running = await startAll(config, env);
const url = `http://${config.host}:${config.gatewayPort}`;
console.log(`
Tubwright is running at ${url}
  API document: ${url}/api/docs
  Demo sign-ins (password "${DEMO_PASSWORD}"):
${DEMO_USERS.map((u) => `    ${u.role.padEnd(8)} ${u.email}`).join('\n')}
  Mail catcher: SMTP ${config.host}:${config.smtpPort}, inbox in the console (owner > Outbox)
  Payments stand-in: http://${config.host}:${config.paymentsPort}
Press Ctrl-C to stop everything.`);

let stopping = false;
const shutdown = async () => {
  if (stopping) return;
  stopping = true;
  console.log('\nStopping…');
  await running.stop();
  process.exit(0);
};
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
for (const child of running.children) {
  child.on('exit', (code, signal) => {
    if (!stopping) {
      console.error(`A process exited (code ${code}, signal ${signal}); stopping the rest.`);
      void shutdown();
    }
  });
}
