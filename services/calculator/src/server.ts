import { loadConfig } from '../../common/src/config.js';
import { listen } from '../../common/src/listen.js';
import { createApp } from './app.js';
import { pooledCutting } from './http/cutting-runner.js';

const config = loadConfig();
const cutting = pooledCutting();
const server = await listen(createApp({ internalSecret: config.internalSecret, runCutting: cutting.run }), config.host, config.calculatorPort, 'calculator');
server.on('close', () => void cutting.close());
