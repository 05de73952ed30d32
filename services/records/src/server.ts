import { loadConfig } from '../../common/src/config.js';
import { listen } from '../../common/src/listen.js';
import { createApp } from './app.js';
import { migrateLatest, openDatabase } from './db/knex.js';

const config = loadConfig();
const db = openDatabase(config.databaseFile);
await migrateLatest(db);
const server = await listen(createApp({ db, internalSecret: config.internalSecret }), config.host, config.recordsPort, 'records');
server.on('close', () => void db.destroy());
