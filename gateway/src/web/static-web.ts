import fs from 'node:fs';
import path from 'node:path';
import express, { Router } from 'express';

const ASSET = /\.(?:js|mjs|css|map|svg|png|jpe?g|gif|webp|ico|woff2?|ttf|json|txt|webmanifest|html)$/i;

export const ELEMENT_NAMES = ['planning', 'collection', 'orders', 'rack-sizer'] as const;

/** The public widget's one script, as a shop's website includes it. */
export const WIDGET_SCRIPT_PATH = '/widget/tw-rack-sizer.js';

/**
 * The console (shell) at /, each module element under /elements/<name>/. Paths that are not
 * files fall back to the shell's index.html so deep links and reloads work.
 */
export function staticWeb(webDir: string): Router {
  const router = Router();
  router.get(WIDGET_SCRIPT_PATH, widgetScript(path.join(webDir, 'rack-sizer', 'main.js')));
  for (const name of ELEMENT_NAMES) {
    router.use(`/elements/${name}`, express.static(path.join(webDir, name), { fallthrough: false, maxAge: '5m' }));
  }
  const shellDir = path.join(webDir, 'shell');
  router.use(express.static(shellDir, { index: false, maxAge: '1h', setHeaders: noCacheForHtml }));
  router.get('/{*path}', (req, res, next) => {
    // A missing file (an asset) is a 404, but a console path may hold a dot (a quote link's signature).
    if (req.path.startsWith('/api/') || ASSET.test(req.path)) return next();
    const index = path.join(shellDir, 'index.html');
    if (!fs.existsSync(index)) {
      res.status(503).type('text').send('The console is not built yet: run `npm run build` (npm start does it for you).');
      return;
    }
    res.setHeader('cache-control', 'no-cache');
    res.sendFile(index);
  });
  return router;
}

function noCacheForHtml(res: express.Response, file: string): void {
  if (file.endsWith('.html')) res.setHeader('cache-control', 'no-cache');
}

/**
 * The rack sizer's bundle (its styles are inside it) for any website: a module script from another
 * origin is fetched with CORS, so every origin may read it. It carries no secrets and sends no
 * cookies; which sites may call the API is the key's business. Short cache: the name has no hash.
 */
function widgetScript(file: string): express.RequestHandler {
  return (_req, res, next) => {
    if (!fs.existsSync(file)) {
      res.status(503).type('text').send('// The widget is not built yet: run `npm run build`.');
      return;
    }
    res.setHeader('access-control-allow-origin', '*');
    res.setHeader('cross-origin-resource-policy', 'cross-origin');
    res.sendFile(file, { maxAge: '5m', headers: { 'content-type': 'text/javascript; charset=utf-8' } }, (err) => err && next(err));
  };
}
