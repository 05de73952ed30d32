import { spawn } from 'node:child_process';
import { ROOT } from './lib/processes.js';

/**
 * `npm test`: every suite in turn (server and reference, Angular components, browser end to end),
 * then one closing line `N passed, N failed` summing them all, so a run that executed nothing shows.
 */
interface Suite {
  name: string;
  command: string[];
}

const node = process.execPath;
const suites: Suite[] = [
  { name: 'server, shared and reference', command: [node, 'node_modules/vitest/vitest.mjs', 'run'] },
  { name: 'Angular components', command: [node, '--import', 'tsx', 'scripts/test-web.ts'] },
  { name: 'browser end to end', command: [node, 'node_modules/vitest/vitest.mjs', 'run', '--config', 'tests/e2e/vitest.config.ts'] },
];

const strip = (text: string) => text.replace(/\x1b\[[0-9;]*m/g, '');

/** Reads vitest's summary lines (`Tests  3 failed | 40 passed (43)`), one per run. */
export function countResults(output: string): { passed: number; failed: number } {
  let passed = 0;
  let failed = 0;
  for (const line of strip(output).split('\n')) {
    const summary = line.match(/^\s*Tests\s+(.*)\(\d+\)\s*$/);
    if (!summary) continue;
    passed += Number(summary[1]!.match(/(\d+) passed/)?.[1] ?? 0);
    failed += Number(summary[1]!.match(/(\d+) failed/)?.[1] ?? 0);
  }
  return { passed, failed };
}

function run(suite: Suite): Promise<{ code: number; output: string }> {
  return new Promise((resolve) => {
    console.log(`\n=== ${suite.name} ===`);
    const child = spawn(suite.command[0]!, suite.command.slice(1), { cwd: ROOT, env: { ...process.env, CI: process.env.CI ?? 'true' } });
    let output = '';
    child.stdout.on('data', (d: Buffer) => {
      output += d;
      process.stdout.write(d);
    });
    child.stderr.on('data', (d: Buffer) => {
      output += d;
      process.stderr.write(d);
    });
    child.on('close', (code) => resolve({ code: code ?? 1, output }));
  });
}

if (import.meta.url === `file://${process.argv[1]}`) {
  let passed = 0;
  let failed = 0;
  let broken = 0;
  const only = process.argv.slice(2);
  for (const suite of suites) {
    if (only.length && !only.some((o) => suite.name.includes(o))) continue;
    const { code, output } = await run(suite);
    const counts = countResults(output);
    passed += counts.passed;
    failed += counts.failed;
    // A suite that exits non-zero without a failed test (crash, build error, no tests) still fails the run.
    if ((code !== 0 && counts.failed === 0) || counts.passed + counts.failed === 0) broken++;
  }
  console.log('');
  if (broken) console.log(`${broken} suite(s) did not run to completion; see above.`);
  console.log(`${passed} passed, ${failed + broken} failed`);
  process.exit(failed + broken > 0 ? 1 : 0);
}
