/* Pure geometry for the small SVG line charts (weights, temperatures): no chart library needed. */

export interface ChartPoint {
  x: number;
  y: number;
}

/** Round tick values (steps of 1, 2 or 5 times a power of ten) covering [min, max]. */
export function niceTicks(min: number, max: number, about = 5): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [];
  if (min === max) {
    const pad = Math.abs(min) > 0 ? Math.abs(min) * 0.1 : 1;
    return niceTicks(min - pad, max + pad, about);
  }
  const raw = (max - min) / Math.max(1, about - 1);
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const first = Math.floor(min / step) * step;
  const ticks: number[] = [];
  for (let v = first; v <= max + step * 1e-9; v += step) ticks.push(round(v, step));
  if (ticks.at(-1)! < max) ticks.push(round(ticks.at(-1)! + step, step));
  return ticks;
}

/** Maps a domain linearly onto a range; a zero-width domain maps to the middle of the range. */
export function linearScale(domain: [number, number], range: [number, number]): (value: number) => number {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  if (d0 === d1) return () => (r0 + r1) / 2;
  return (value) => r0 + ((value - d0) / (d1 - d0)) * (r1 - r0);
}

/** `M x y L x y …` with coordinates to one decimal. */
export function linePath(points: readonly ChartPoint[], sx: (x: number) => number, sy: (y: number) => number): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${fix(sx(p.x))} ${fix(sy(p.y))}`).join(' ');
}

/** `count` evenly spaced values from min to max, both included (x-axis dates). */
export function spread(min: number, max: number, count: number): number[] {
  if (count <= 1 || min === max) return [min];
  return Array.from({ length: count }, (_, i) => min + ((max - min) * i) / (count - 1));
}

const fix = (n: number) => Math.round(n * 10) / 10;

function round(value: number, step: number): number {
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  return Number(value.toFixed(decimals));
}
