import { execSync } from 'node:child_process';
import fs from 'node:fs';

export const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

/** Debian's Chromium: installed on the spot when we are root with apt-get, else a one-line instruction. */
export function ensureChromium(): void {
  if (fs.existsSync(CHROMIUM)) return;
  const isRoot = process.getuid?.() === 0;
  const hasApt = fs.existsSync('/usr/bin/apt-get');
  if (!isRoot || !hasApt) {
    throw new Error(`Browser tests need Chromium at ${CHROMIUM}: run "sudo apt-get install -y chromium" (or set CHROMIUM_PATH).`);
  }
  console.log('Installing Debian\'s chromium for the browser tests…');
  execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', { stdio: 'inherit' });
}

/** Flags for a closed network: no background calls home, no sandbox as root. */
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
];
