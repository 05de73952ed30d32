import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { ROOT } from './lib/processes.js';

/** Runs `ng test` for each Angular project that has component specs, one after another. */
const projectsDir = path.join(ROOT, 'projects');

function hasSpecs(dir: string): boolean {
  return fs.readdirSync(dir, { withFileTypes: true }).some((e) =>
    e.isDirectory() ? hasSpecs(path.join(dir, e.name)) : e.name.endsWith('.spec.ts'),
  );
}

const angular = JSON.parse(fs.readFileSync(path.join(ROOT, 'angular.json'), 'utf8')) as {
  projects: Record<string, { root: string; architect?: Record<string, unknown> }>;
};
let failed = false;
for (const [name, project] of Object.entries(angular.projects)) {
  if (!project.architect?.['test'] || !hasSpecs(path.join(ROOT, project.root))) continue;
  console.log(`--- ng test ${name}`);
  const result = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/@angular/cli/bin/ng.js'), 'test', name, '--watch=false'], {
    cwd: ROOT,
    stdio: 'inherit',
    env: { ...process.env, CI: 'true', NG_CLI_ANALYTICS: 'false' },
  });
  if (result.status !== 0) failed = true;
}
process.exit(failed ? 1 : 0);
