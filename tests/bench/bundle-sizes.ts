import fs from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

const KiB = 1024;

export interface BundleSize {
  name: string;
  gzipKiB: number;
  targetKiB: number;
  /** Module elements: all their JavaScript, pages loaded on first use included (no target). */
  allGzipKiB?: number;
}

const gz = (file: string) => gzipSync(fs.readFileSync(file), { level: 9 }).length / KiB;

/** The shell's initial JavaScript is what index.html loads up front; lazy chunks are not counted. */
function shellInitialFiles(shellDir: string): string[] {
  const html = fs.readFileSync(path.join(shellDir, 'index.html'), 'utf8');
  const scripts = [...html.matchAll(/<script[^>]+src="([^"]+\.js)"/g)].map((m) => m[1]!);
  const preloads = [...html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+\.js)"/g)].map((m) => m[1]!);
  return [...new Set([...scripts, ...preloads])].map((src) => path.join(shellDir, src.replace(/^\//, '')));
}

/** A script and every chunk it imports statically: what the browser fetches before the element can render. */
function staticClosure(dir: string, entry: string, seen = new Set<string>()): Set<string> {
  if (seen.has(entry)) return seen;
  seen.add(entry);
  const source = fs.readFileSync(path.join(dir, entry), 'utf8');
  for (const m of source.matchAll(/(?:^|[;}\s])import\s*(?:[\w{}\s,$]*from\s*)?"\.\/([\w-]+\.js)"/g)) staticClosure(dir, m[1]!, seen);
  return seen;
}

export function bundleSizes(webDir: string): BundleSize[] {
  const shellDir = path.join(webDir, 'shell');
  const sizes: BundleSize[] = [
    { name: 'shell (initial JS)', gzipKiB: shellInitialFiles(shellDir).reduce((sum, f) => sum + gz(f), 0), targetKiB: 150 },
  ];
  for (const name of ['planning', 'collection', 'orders', 'rack-sizer']) {
    const dir = path.join(webDir, name);
    const js = fs.readdirSync(dir).filter((f) => f.endsWith('.js'));
    // The widget goes on other people's websites: its script and styles (inside it) must stay under 150 kB.
    const targetKiB = name === 'rack-sizer' ? 146 : 200;
    // A module switch loads main.js and what it imports statically; pages behind @defer load on first use.
    const initial = [...staticClosure(dir, 'main.js')].reduce((sum, f) => sum + gz(path.join(dir, f)), 0);
    sizes.push({ name: `${name} element (initial JS)`, gzipKiB: initial, targetKiB, allGzipKiB: js.reduce((sum, f) => sum + gz(path.join(dir, f)), 0) });
  }
  const tenth = (n: number) => Math.round(n * 10) / 10;
  return sizes.map((s) => ({ ...s, gzipKiB: tenth(s.gzipKiB), ...(s.allGzipKiB !== undefined && { allGzipKiB: tenth(s.allGzipKiB) }) }));
}
