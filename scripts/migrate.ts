import { loadConfig } from '../services/common/src/config.js';
import { prepareDatabase } from './lib/database.js';

const config = loadConfig();
const { applied } = await prepareDatabase(config.databaseUrl, { seed: false });
console.log(applied.length ? `Applied ${applied.join(', ')}` : 'The database is up to date.');
