import { loadConfig } from '../../common/src/config.js';
import { listen } from '../../common/src/listen.js';
import { createApp } from './app.js';
import { MailStore } from './mail-store.js';
import { createSmtpServer } from './smtp.js';

const config = loadConfig();
const store = new MailStore();
const smtp = createSmtpServer(store);
await new Promise<void>((resolve, reject) => {
  smtp.once('error', reject);
  smtp.listen(config.smtpPort, config.host, () => resolve());
});
console.log(`[mail] SMTP on ${config.host}:${config.smtpPort}`);
const server = await listen(createApp({ store, internalSecret: config.internalSecret }), config.host, config.mailHttpPort, 'mail');
server.on('close', () => smtp.close(() => undefined));
