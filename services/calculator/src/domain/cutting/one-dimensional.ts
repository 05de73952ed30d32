import { martelloTothL2 } from './lower-bounds.js';

export interface BinPackingOptions {
  /** Stop searching at this Date.now() value and return the best found. */
  deadline?: number;
  /** Search nodes per target bin count before giving up on it. */
  nodeLimit?: number;
  /** Seed of the restarts' tie-breaking. */
  seed?: number;
}

export interface BinPackingResult {
  /** Item indices per bin. */
  bins: number[][];
  lowerBound: number;
  /** True when the bin count equals the lower bound or the search proved no smaller count exists. */
  optimal: boolean;
}

const SCALES = [1, 2, 4, 8, 16, 32, 64, 128, 10, 20, 40, 80, 160, 320, 100, 200, 400, 800, 1000, 10000, 100000];

/**
 * Integer arithmetic keeps exact fits exact (36.6 + 26.8 + 36.6 is not 100 in floating point). Picks
 * the smallest scale that makes every value an integer; otherwise rounds sizes up and the capacity
 * down at a fine scale, which can only make the plan safer.
 */
export function toIntegers(sizes: readonly number[], capacity: number): { sizes: number[]; capacity: number } {
  const all = [...sizes, capacity];
  for (const m of SCALES) {
    if (all.every((v) => Math.abs(v * m - Math.round(v * m)) < 1e-6 * Math.max(1, m)) && capacity * m < 2 ** 40) {
      return { sizes: sizes.map((s) => Math.round(s * m)), capacity: Math.round(capacity * m) };
    }
  }
  const m = 1e6 / capacity;
  return { sizes: sizes.map((s) => Math.ceil(s * m - 1e-9)), capacity: Math.floor(capacity * m + 1e-9) };
}

/** First- or best-fit decreasing on integer sizes; returns bins of item indices. */
function fitDecreasing(order: readonly number[], sizes: readonly number[], capacity: number, best: boolean): number[][] {
  const bins: number[][] = [];
  const free: number[] = [];
  for (const i of order) {
    let chosen = -1;
    for (let b = 0; b < bins.length; b++) {
      if (free[b] >= sizes[i] && (chosen < 0 || (best && free[b] < free[chosen]))) {
        chosen = b;
        if (!best) break;
      }
    }
    if (chosen < 0) {
      bins.push([]);
      free.push(capacity);
      chosen = bins.length - 1;
    }
    bins[chosen].push(i);
    free[chosen] -= sizes[i];
  }
  return bins;
}

class SearchAborted extends Error {}

/** Small deterministic generator (mulberry32) so plans are reproducible. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Bin completion (Korf 2002): fill one bin at a time, always with the largest item left plus an
 * undominated (maximal) subset of the others, least waste first, pruned by the waste the target
 * bin count allows. Finds `target` bins or proves there are none (returns null), or throws
 * SearchAborted at the node limit.
 */
function binCompletion(
  typeSizes: readonly number[],
  typeCounts: number[],
  capacity: number,
  target: number,
  nodeLimit: number,
  deadline: number,
  random: (() => number) | null,
  proof: { complete: boolean },
): number[][] | null {
  const m = typeSizes.length;
  let remainingSum = 0;
  let remainingItems = 0;
  for (let t = 0; t < m; t++) {
    remainingSum += typeSizes[t] * typeCounts[t];
    remainingItems += typeCounts[t];
  }
  let nodes = 0;
  const chosen: number[][] = [];

  // Maximal subsets of the available items with total in [room - wasteLeft, room]. With `best`, keeps
  // the `cap` fullest (pruning with the cap-th waste found so far); otherwise stops at `cap`.
  const completions = (room: number, wasteLeft: number, cap: number, best: boolean): { list: number[][]; truncated: boolean } => {
    let list: Array<{ items: number[]; waste: number }> = [];
    let truncated = false;
    let visits = 0;
    let wasteCut = wasteLeft;
    const pick: number[] = [];
    // suffix[t]: total size of the items still available among types t.. (a cap on what can be added).
    const suffix = new Array<number>(m + 1).fill(0);
    for (let t = m - 1; t >= 0; t--) suffix[t] = suffix[t + 1] + typeSizes[t] * typeCounts[t];
    const walk = (t: number, left: number) => {
      if ((!best && list.length >= cap) || ++visits > 50_000) {
        truncated = true;
        return;
      }
      while (t < m && (typeSizes[t] > left || typeCounts[t] === 0)) t++;
      // Even taking everything smaller would waste more than allowed.
      if (left - suffix[t] > wasteCut) return;
      if (t >= m) {
        // Maximal: nothing still available fits into what is left (items in `pick` are taken).
        if (left <= wasteCut && !hasFitting(left)) {
          list.push({ items: [...pick], waste: left });
          if (best && list.length > cap) {
            list.sort((a, b) => a.waste - b.waste);
            list = list.slice(0, cap);
            truncated = true;
            // Only strictly better completions can still enter; equal ones would be dropped anyway.
            wasteCut = list[cap - 1].waste - 1;
          }
        }
        return;
      }
      const max = Math.min(typeCounts[t], Math.floor(left / typeSizes[t]));
      for (let c = max; c >= 0; c--) {
        for (let k = 0; k < c; k++) pick.push(t);
        typeCounts[t] -= c;
        walk(t + 1, left - c * typeSizes[t]);
        typeCounts[t] += c;
        pick.length -= c;
      }
    };
    walk(0, room);
    return { list: list.map((c) => c.items), truncated };
  };
  const hasFitting = (left: number): boolean => {
    for (let u = m - 1; u >= 0; u--) if (typeCounts[u] > 0) return typeSizes[u] <= left;
    return false;
  };

  const sumOf = (c: number[]) => c.reduce((s, t) => s + typeSizes[t], 0);
  const dfs = (binsLeft: number): boolean => {
    if (remainingItems === 0) return true;
    if (binsLeft === 0) return false;
    const wasteLeft = binsLeft * capacity - remainingSum;
    if (wasteLeft < 0) return false;
    if (++nodes > nodeLimit || ((nodes & 255) === 0 && Date.now() > deadline)) throw new SearchAborted();
    let pivot = 0;
    while (typeCounts[pivot] === 0) pivot++;
    let options: { list: number[][]; truncated: boolean } | null = null;
    if (wasteLeft < capacity / 4) {
      // Tight budget: branch on the item with the fewest completions (fail first); an item with none
      // proves the node infeasible.
      for (let t = 0; t < m; t++) {
        if (typeCounts[t] === 0) continue;
        typeCounts[t]--;
        const found = completions(capacity - typeSizes[t], wasteLeft, options ? options.list.length : 400, false);
        typeCounts[t]++;
        if (found.list.length === 0 && !found.truncated) return false;
        if (!options || found.list.length < options.list.length) {
          options = found;
          pivot = t;
          if (found.list.length <= 1) break;
        }
      }
    }
    typeCounts[pivot]--;
    if (!options) options = completions(capacity - typeSizes[pivot], wasteLeft, 40, true);
    if (options.truncated) proof.complete = false;
    const list = options.list;
    if (random) {
      // Restarts with random tie-breaking cut the heavy tail of backtracking search.
      for (let i = list.length - 1; i > 0; i--) {
        const j = Math.floor(random() * (i + 1));
        [list[i], list[j]] = [list[j], list[i]];
      }
    }
    list.sort((a, b) => sumOf(b) - sumOf(a));
    for (const option of list) {
      const filled = typeSizes[pivot] + sumOf(option);
      for (const t of option) typeCounts[t]--;
      remainingSum -= filled;
      remainingItems -= option.length + 1;
      chosen.push([pivot, ...option]);
      if (dfs(binsLeft - 1)) return true;
      chosen.pop();
      remainingItems += option.length + 1;
      remainingSum += filled;
      for (const t of option) typeCounts[t]++;
    }
    typeCounts[pivot]++;
    return false;
  };

  // The largest item must go in some bin; the completion step needs types sorted by size, descending.
  return dfs(target) ? chosen : null;
}

/**
 * Local search after Levine and Ducatelle (2004): dissolve the least-filled bins, then let every other
 * bin swap up to two of its items for up to two free ones whenever that makes it fuller; free items
 * that are left are packed first-fit decreasing. A pass that ends with fewer bins is kept.
 */
export function improveBySwaps(
  start: number[][],
  sizes: readonly number[],
  capacity: number,
  target: number,
  deadline: number,
  random: () => number,
): number[][] {
  let best = start;
  const load = (bin: number[]) => bin.reduce((s, i) => s + sizes[i], 0);
  let current = start.map((b) => [...b]);
  for (let round = 0; best.length > target && Date.now() < deadline; round++) {
    const bins = current.map((b) => [...b]);
    bins.sort((a, b) => load(a) - load(b));
    // Dissolve the two or three emptiest bins, sometimes a random one instead, to diversify.
    const dissolve = 2 + (round % 2);
    let free: number[] = [];
    for (let k = 0; k < dissolve && bins.length > 0; k++) {
      const at = random() < 0.3 ? Math.floor(random() * bins.length) : 0;
      free.push(...bins.splice(at, 1)[0]);
    }
    let improved = true;
    for (let pass = 0; improved && pass < 20; pass++) {
      improved = false;
      for (const bin of bins) {
        const l = load(bin);
        let bestGain = 0;
        let bestOut: number[] = [];
        let bestIn: number[] = [];
        const tryMove = (out: number[], into: number[]) => {
          const gain = into.reduce((s, i) => s + sizes[i], 0) - out.reduce((s, i) => s + sizes[i], 0);
          if (gain > bestGain && l + gain <= capacity) {
            bestGain = gain;
            bestOut = out;
            bestIn = into;
          }
        };
        const outs: number[][] = [[]];
        for (let a = 0; a < bin.length; a++) {
          outs.push([bin[a]]);
          for (let b = a + 1; b < bin.length; b++) outs.push([bin[a], bin[b]]);
        }
        for (const out of outs) {
          for (let r = 0; r < free.length; r++) {
            tryMove(out, [free[r]]);
            for (let q = r + 1; q < free.length; q++) tryMove(out, [free[r], free[q]]);
          }
        }
        if (bestGain > 0) {
          for (const i of bestOut) bin.splice(bin.indexOf(i), 1);
          bin.push(...bestIn);
          free = free.filter((i) => !bestIn.includes(i));
          free.push(...bestOut);
          improved = true;
        }
      }
    }
    free.sort((a, b) => sizes[b] - sizes[a]);
    const fresh = fitDecreasing(free, sizes, capacity, true);
    const next = [...bins, ...fresh];
    if (next.length < best.length) best = next.map((b) => [...b]);
    // Keep walking from equal solutions too: the moves change which bins are emptiest.
    if (next.length <= current.length) current = next;
  }
  return best;
}

/**
 * One-dimensional bin packing: first/best-fit decreasing, then exact bin completion towards the
 * L2 lower bound within the node and time limits. Returns the best packing found.
 */
export function solveBinPacking(sizesIn: readonly number[], capacityIn: number, options: BinPackingOptions = {}): BinPackingResult {
  const n = sizesIn.length;
  if (n === 0) return { bins: [], lowerBound: 0, optimal: true };
  const { sizes, capacity } = toIntegers(sizesIn, capacityIn);
  for (let i = 0; i < n; i++) {
    if (sizes[i] > capacity) throw new RangeError(`item ${i} (${sizesIn[i]}) exceeds the capacity ${capacityIn}`);
  }
  const lowerBound = martelloTothL2(sizes, capacity);
  const order = [...sizes.keys()].sort((a, b) => sizes[b] - sizes[a]);
  let best = fitDecreasing(order, sizes, capacity, false);
  const bfd = fitDecreasing(order, sizes, capacity, true);
  if (bfd.length < best.length) best = bfd;
  if (best.length <= lowerBound) return { bins: best, lowerBound, optimal: true };

  // Group equal sizes into types so the search does not branch over interchangeable items.
  const typeSizes: number[] = [];
  const typeItems: number[][] = [];
  for (const i of order) {
    if (typeSizes.length > 0 && typeSizes[typeSizes.length - 1] === sizes[i]) typeItems[typeItems.length - 1].push(i);
    else {
      typeSizes.push(sizes[i]);
      typeItems.push([i]);
    }
  }
  const deadline = options.deadline ?? Date.now() + 2000;
  const random = seededRandom(options.seed ?? 1);
  const nodeLimit = options.nodeLimit ?? 200_000;
  let provenBelow = lowerBound; // every count below this is proven infeasible
  const counts = () => typeItems.map((l) => l.length);
  const adopt = (found: number[][]) => {
    const cursor = typeItems.map(() => 0);
    best = found.map((bin) => bin.map((t) => typeItems[t][cursor[t]++]));
  };
  const attempt = (target: number, limit: number, randomised: boolean): 'found' | 'infeasible' | 'unknown' => {
    const proof = { complete: true };
    try {
      const found = binCompletion(typeSizes, counts(), capacity, target, limit, deadline, randomised ? random : null, proof);
      if (found) {
        adopt(found);
        return 'found';
      }
      return proof.complete ? 'infeasible' : 'unknown';
    } catch (e) {
      if (e instanceof SearchAborted) return 'unknown';
      throw e;
    }
  };
  const swapUntil = Math.min(deadline, Date.now() + Math.max(20, (deadline - Date.now()) * 0.3));
  best = improveBySwaps(best, sizes, capacity, lowerBound, swapUntil, random);
  if (best.length <= lowerBound) return { bins: best, lowerBound, optimal: true };
  // Tighten the heuristic answer one bin at a time with short searches (loose targets are easy)...
  for (let target = best.length - 1; target > lowerBound && Date.now() < deadline; target--) {
    if (attempt(target, 3000, false) !== 'found') break;
  }
  // ...then aim at the bound with restarts of growing length, moving up when a target is disproved.
  let target = lowerBound;
  let limit = 1000;
  for (let run = 0; target < best.length && Date.now() < deadline; run++) {
    const outcome = attempt(target, limit, run > 0);
    if (outcome === 'found') break;
    if (outcome === 'infeasible') {
      provenBelow = ++target;
      run = -1;
      limit = 1000;
    } else limit = Math.min(nodeLimit, Math.ceil(limit * 1.2));
  }
  return { bins: best, lowerBound: Math.max(lowerBound, Math.min(provenBelow, best.length)), optimal: best.length <= provenBelow };
}

/**
 * Cuts pieces of the given lengths from boards of `boardLength`. Each cut eats `kerf`; the last
 * piece on a board needs no cut when it ends at the board's end, hence capacity L + kerf for
 * sizes l + kerf.
 */
export function cutOneDimensional(
  lengths: readonly number[],
  boardLength: number,
  kerf: number,
  options: BinPackingOptions = {},
): BinPackingResult {
  return solveBinPacking(
    lengths.map((l) => l + kerf),
    boardLength + kerf,
    options,
  );
}
