import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { ROOT } from './lib/processes.js';

/** Angular projects served by the gateway, shell first; each builds into dist/web/<name>. */
export const WEB_PROJECTS = ['shell', 'planning', 'collection', 'orders', 'rack-sizer'] as const;
const STAMP = '.built';

function newestMtime(target: string): number {
  if (!fs.existsSync(target)) return 0;
  const stat = fs.statSync(target);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of fs.readdirSync(target)) {
    if (entry === 'node_modules' || entry.startsWith('.')) continue;
    newest = Math.max(newest, newestMtime(path.join(target, entry)));
  }
  return newest;
}

/** A project is stale when its output is missing or older than its sources, the kit, shared code or the workspace files. */
export function staleProjects(force = false): string[] {
  const common = Math.max(
    newestMtime(path.join(ROOT, 'projects/kit')),
    newestMtime(path.join(ROOT, 'shared')),
    newestMtime(path.join(ROOT, 'angular.json')),
    newestMtime(path.join(ROOT, 'package-lock.json')),
  );
  return WEB_PROJECTS.filter((name) => {
    if (force) return true;
    const stamp = path.join(ROOT, 'dist/web', name, STAMP);
    if (!fs.existsSync(stamp)) return true;
    const built = fs.statSync(stamp).mtimeMs;
    return Math.max(common, newestMtime(path.join(ROOT, 'projects', name))) > built;
  });
}

export function buildWeb(force = false): void {
  const stale = staleProjects(force);
  if (!stale.length) {
    console.log('Console and elements are up to date.');
    return;
  }
  const ng = path.join(ROOT, 'node_modules/@angular/cli/bin/ng.js');
  for (const name of stale) {
    console.log(`Building ${name}…`);
    // Builds run one after another: on two cores parallel builds are no faster.
    const result = spawnSync(process.execPath, [ng, 'build', name], {
      cwd: ROOT,
      stdio: 'inherit',
      env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
    });
    if (result.status !== 0) throw new Error(`Building ${name} failed (exit ${result.status}).`);
    fs.writeFileSync(path.join(ROOT, 'dist/web', name, STAMP), new Date().toISOString());
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  buildWeb(process.argv.includes('--force'));
}
