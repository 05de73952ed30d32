import { loadConfig } from '../../common/src/config.js';
import { listen } from '../../common/src/listen.js';
import { createApp } from './app.js';

const config = loadConfig();
await listen(createApp({ internalSecret: config.internalSecret }), config.host, config.calculatorPort, 'calculator');
