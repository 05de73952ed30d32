import { loadConfig } from '../services/common/src/config.js';
import { prepareDatabase } from './lib/database.js';

const config = loadConfig();
const { seeded } = await prepareDatabase(config.databaseUrl, { seed: true });
console.log(seeded ? 'Seeded the demo data.' : 'The database already has users; nothing seeded.');
