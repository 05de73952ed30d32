import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

/**
 * Secrets for a local install: taken from the environment when set, otherwise generated once and
 * kept in data/secrets.json (git-ignored), so sessions survive a restart.
 */
export function localSecrets(dataDir: string, env: NodeJS.ProcessEnv): Record<string, string> {
  const file = path.join(dataDir, 'secrets.json');
  let stored: Record<string, string> = {};
  if (fs.existsSync(file)) stored = JSON.parse(fs.readFileSync(file, 'utf8')) as Record<string, string>;
  const wanted = ['JWT_SECRET', 'INTERNAL_SECRET'];
  let changed = false;
  for (const name of wanted) {
    if (!stored[name]) {
      stored[name] = randomBytes(32).toString('base64url');
      changed = true;
    }
  }
  if (changed) {
    fs.mkdirSync(dataDir, { recursive: true });
    fs.writeFileSync(file, JSON.stringify(stored, null, 2), { mode: 0o600 });
  }
  return Object.fromEntries(wanted.map((name) => [name, env[name] || stored[name]!]));
}
