import http from 'node:http';
import type { RequestListener } from 'node:http';

/** Starts a server and closes it cleanly on SIGINT/SIGTERM, so one Ctrl-C stops every process. */
export function listen(app: RequestListener, host: string, port: number, name: string): Promise<http.Server> {
  const server = http.createServer(app);
  server.keepAliveTimeout = 65_000;
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      console.log(`[${name}] listening on http://${host}:${port}`);
      const stop = () => {
        server.close(() => process.exit(0));
        server.closeAllConnections();
        setTimeout(() => process.exit(0), 2000).unref();
      };
      process.once('SIGINT', stop);
      process.once('SIGTERM', stop);
      resolve(server);
    });
  });
}
