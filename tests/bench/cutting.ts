/**
 * Cutting-plan quality and speed: `npx tsx tests/bench/cutting.ts`.
 * Rack part lists follow the trade rules (see rackParts); 1D instances are Falkenauer's (OR-Library,
 * CC0 via ESICUP), 2D instances are built with a known optimum (tests/reference/data/constructed-2d.ts).
 */
import type { MaxRectsPacker as MaxRectsPackerType } from 'maxrects-packer';
// The package's "main" is a UMD file that Node's ESM loader sees no exports in; its ES build has them.
// @ts-expect-error the ES build ships without its own declaration file; typed through the package's.
import { MaxRectsPacker as MaxRectsPackerUntyped } from 'maxrects-packer/dist/maxrects-packer.mjs';
const MaxRectsPacker = MaxRectsPackerUntyped as typeof MaxRectsPackerType;
import { pathToFileURL } from 'node:url';
import { CuttingPlanRequest, type CuttingPart, type CuttingPlanRequestInput } from '../../shared/api/cutting-plan.js';
import { planCutting } from '../../services/calculator/src/domain/cutting/cutting-plan.js';
import { checkPlan } from '../../services/calculator/src/domain/cutting/layout-checker.js';
import { cutOneDimensional } from '../../services/calculator/src/domain/cutting/one-dimensional.js';
import { constructedInstance } from '../reference/data/constructed-2d.js';
import { readOrLibrary } from '../reference/data/or-library.js';

const KERF = 0.125;
const SHEET = { length: 96, width: 48 };

interface Tub {
  length: number;
  width: number;
  height: number;
}

/**
 * Parts of one rack section, inches: a level opening is the tub height + 1/8; an interior shelf is
 * columns x tub width + 1/2 play + 1/2 per divider between columns; top and bottom are 1 longer;
 * depth is tub length + 1/2; a side panel is levels x opening + (levels - 1) x 1/2. Dividers are one
 * per column gap per level. Base: plywood bottom and a 2x4 frame (two rails, three cross members).
 */
export function rackParts(levels: number, columns: number, tub: Tub, source: string): CuttingPart[] {
  const opening = tub.height + 0.125;
  const shelf = columns * tub.width + 0.5 + 0.5 * (columns - 1);
  const depth = tub.length + 0.5;
  const side = levels * opening + (levels - 1) * 0.5;
  const part = (name: string, material: string, length: number, width: number | undefined, quantity: number): CuttingPart => ({
    name,
    material,
    length,
    width,
    quantity,
    canRotate: true,
    source,
  });
  const parts = [
    part('side panel', 'pvc-1/2', side, depth, 2),
    part('interior shelf', 'pvc-1/2', shelf, depth, levels - 1),
    part('top/bottom', 'pvc-1/2', shelf + 1, depth, 2),
    part('plywood bottom', 'ply-3/4', shelf + 1, depth, 1),
    part('base rail', '2x4', shelf + 1, undefined, 2),
    part('base cross member', '2x4', depth - 3, undefined, 3),
  ];
  if (columns > 1) parts.push(part('divider', 'pvc-1/2', opening, depth, levels * (columns - 1)));
  return parts.filter((p) => p.quantity > 0);
}

export function rackRequest(parts: CuttingPart[], timeLimitMs = 2000): CuttingPlanRequestInput {
  return {
    unit: 'in',
    kerf: KERF,
    stock: [
      { material: 'pvc-1/2', kind: 'sheet', ...SHEET },
      { material: 'ply-3/4', kind: 'sheet', ...SHEET },
      { material: '2x4', kind: 'board', length: 96 },
    ],
    parts,
    timeLimitMs,
  };
}

const TUBS: Record<string, Tub> = {
  '23 x 16.25 x 6.5': { length: 23, width: 16.25, height: 6.5 },
  '34 x 17 x 6': { length: 34, width: 17, height: 6 },
  '17 x 12 x 4.5': { length: 17, width: 12, height: 4.5 },
  '28 x 16.5 x 7': { length: 28, width: 16.5, height: 7 },
};

/** Rack-like instances: [name, parts]. The 72-tub rack is 12 levels x 6 columns as two sections of 3. */
function rackInstances(): Array<[string, CuttingPart[]]> {
  const t = TUBS;
  const list: Array<[string, CuttingPart[]]> = [
    ['27 tubs: 9 x 3 of 23x16.25x6.5', rackParts(9, 3, t['23 x 16.25 x 6.5'], 'A')],
    ['72 tubs: 12 x 6 (2 sections) of 23x16.25x6.5', seventyTwo()],
    ['16 tubs: 8 x 2 of 34x17x6', rackParts(8, 2, t['34 x 17 x 6'], 'B')],
    ['40 tubs: 10 x 4 of 17x12x4.5', rackParts(10, 4, t['17 x 12 x 4.5'], 'C')],
    ['12 tubs: 6 x 2 of 28x16.5x7', rackParts(6, 2, t['28 x 16.5 x 7'], 'D')],
    ['5 tubs: 5 x 1 of 23x16.25x6.5', rackParts(5, 1, t['23 x 16.25 x 6.5'], 'E')],
  ];
  list.push(['batch of ten mixed racks', tenRacks()]);
  return list;
}

function seventyTwo(): CuttingPart[] {
  const tub = TUBS['23 x 16.25 x 6.5'];
  return [...rackParts(12, 3, tub, 'left section'), ...rackParts(12, 3, tub, 'right section')];
}

export function tenRacks(): CuttingPart[] {
  const configs: Array<[number, number, string]> = [
    [9, 3, '23 x 16.25 x 6.5'],
    [12, 3, '23 x 16.25 x 6.5'],
    [8, 2, '34 x 17 x 6'],
    [10, 4, '17 x 12 x 4.5'],
    [6, 2, '28 x 16.5 x 7'],
    [5, 1, '23 x 16.25 x 6.5'],
    [7, 3, '28 x 16.5 x 7'],
    [11, 2, '17 x 12 x 4.5'],
    [6, 4, '23 x 16.25 x 6.5'],
    [4, 2, '34 x 17 x 6'],
  ];
  return configs.flatMap(([levels, columns, tub], i) => rackParts(levels, columns, TUBS[tub], `rack ${i + 1}`));
}

/** maxrects-packer on the same sheets with padding = kerf: sheets per material. */
function maxrectsSheets(parts: CuttingPart[], material: string): number {
  const packer = new MaxRectsPacker(SHEET.length, SHEET.width, KERF, { smart: false, pot: false, square: false, allowRotation: true });
  for (const p of parts.filter((x) => x.material === material)) {
    for (let k = 0; k < p.quantity; k++) packer.add(p.length, p.width!, { name: p.name });
  }
  return packer.bins.length;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export interface CuttingBenchFigures {
  racks: Array<{ name: string; material: string; ours: number; lowerBound: number; maxrects: number; valid: boolean; ms: number }>;
  neverWorseThanMaxrects: boolean;
  allLayoutsValid: boolean;
  oneDimensional: { solved: number; total: number; share: number };
  twoDimensional: { solved: number; total: number; share: number };
  seventyTwoTubMedianMs: number;
  tenRackBatchMs: number;
}

export function runCuttingBench(log: (line: string) => void = () => {}): CuttingBenchFigures {
  const racks: CuttingBenchFigures['racks'] = [];
  log('Rack instances (sheets 96 x 48, kerf 1/8): ours vs maxrects-packer 2.7.4 (padding = kerf)');
  for (const [name, parts] of rackInstances()) {
    const request = CuttingPlanRequest.parse(rackRequest(parts, 2500));
    const started = performance.now();
    const plan = planCutting(request);
    const ms = performance.now() - started;
    const valid = checkPlan(request, plan).length === 0;
    for (const m of plan.materials.filter((x) => x.kind === 'sheet')) {
      const row = { name, material: m.material, ours: m.stockUsed, lowerBound: m.lowerBound, maxrects: maxrectsSheets(parts, m.material), valid, ms };
      racks.push(row);
      log(`  ${name.padEnd(46)} ${m.material.padEnd(8)} ours ${String(row.ours).padStart(3)} (bound ${row.lowerBound})  maxrects ${String(row.maxrects).padStart(3)}  ${valid ? 'valid' : 'INVALID'}  ${ms.toFixed(0)} ms`);
    }
  }
  const neverWorseThanMaxrects = racks.every((r) => r.ours <= r.maxrects);
  const allLayoutsValid = racks.every((r) => r.valid);

  let solved1 = 0;
  let total1 = 0;
  for (const file of ['binpack5.txt', 'binpack6.txt', 'binpack2.txt']) {
    for (const inst of readOrLibrary(file)) {
      const r = cutOneDimensional(inst.items, inst.capacity, 0, { deadline: Date.now() + 2000 });
      total1++;
      // `best` is the optimum, or for u250_07/12/13 the best known value in 1996.
      if (r.bins.length <= inst.best) solved1++;
      else log(`  1D ${inst.id.trim()}: ${r.bins.length} bins, known ${inst.best}`);
    }
  }
  log(`1D Falkenauer instances (t60, t120, u250; OR-Library) solved to the known optimum: ${solved1}/${total1} = ${((100 * solved1) / total1).toFixed(1)} %`);

  let solved2 = 0;
  const total2 = 100;
  for (let seed = 1; seed <= total2; seed++) {
    const inst = constructedInstance(seed);
    const request = CuttingPlanRequest.parse({
      unit: 'in',
      kerf: 0,
      stock: [{ material: 'sheet', kind: 'sheet', length: inst.sheetLength, width: inst.sheetWidth }],
      parts: inst.pieces.map((p, i) => ({ name: `piece ${i + 1}`, material: 'sheet', length: p.length, width: p.width, canRotate: inst.canRotate })),
      timeLimitMs: 2000,
    });
    const plan = planCutting(request);
    if (plan.materials[0].stockUsed === inst.sheets && checkPlan(request, plan).length === 0) solved2++;
  }
  log(`2D constructed instances (random guillotine cuts, zero kerf) solved to the optimum: ${solved2}/${total2} = ${solved2} %`);

  const seventyTwoRequest = CuttingPlanRequest.parse(rackRequest(seventyTwo()));
  const runs: number[] = [];
  for (let k = 0; k < 9; k++) {
    const started = performance.now();
    planCutting(seventyTwoRequest);
    runs.push(performance.now() - started);
  }
  const seventyTwoTubMedianMs = median(runs);
  log(`72-tub rack (PVC, plywood, 2x4) nested: median ${seventyTwoTubMedianMs.toFixed(1)} ms of ${runs.length} runs (target < 200 ms)`);

  const batch = CuttingPlanRequest.parse(rackRequest(tenRacks(), 2500));
  const started = performance.now();
  const batchPlan = planCutting(batch);
  const tenRackBatchMs = performance.now() - started;
  const pieces = batch.parts.reduce((s, p) => s + p.quantity, 0);
  log(`Ten mixed racks in one batch (${pieces} pieces): ${tenRackBatchMs.toFixed(0)} ms (target < 3000 ms), sheets ${batchPlan.materials.map((m) => `${m.material} ${m.stockUsed}/${m.lowerBound}`).join(', ')}`);
  log(`Never more sheets than maxrects-packer: ${neverWorseThanMaxrects}; every layout guillotine-valid: ${allLayoutsValid}`);

  return {
    racks,
    neverWorseThanMaxrects,
    allLayoutsValid,
    oneDimensional: { solved: solved1, total: total1, share: solved1 / total1 },
    twoDimensional: { solved: solved2, total: total2, share: solved2 / total2 },
    seventyTwoTubMedianMs,
    tenRackBatchMs,
  };
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  runCuttingBench((line) => console.log(line));
}
