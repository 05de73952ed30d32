import type { AnimalGene, Trait } from '../core/collection-types';

export type GeneState = AnimalGene['state'];

/** One line of the gene editor; probability as typed, in percent. */
export interface GeneRow {
  traitId: number | null;
  state: GeneState;
  hetPercent: string;
}

/** States that fit a trait's mode (the records service refuses the others). */
export function statesFor(mode: Trait['mode']): GeneState[] {
  return mode === 'recessive' ? ['het', 'visual', 'possible-het'] : ['single', 'super'];
}

export const STATE_LABELS: Record<GeneState, string> = {
  het: 'het',
  visual: 'visual',
  'possible-het': 'possible het',
  single: 'single (one copy)',
  super: 'super (two copies)',
};

export function rowsFromGenes(genes: readonly AnimalGene[]): GeneRow[] {
  return genes.map((g) => ({
    traitId: g.traitId,
    state: g.state,
    hetPercent: g.hetProbability === null ? '' : String(Math.round(g.hetProbability * 10000) / 100),
  }));
}

/**
 * The PUT /animals/:id/genes body, or the first problem in words. Rows without a trait are
 * ignored (a row just added); a trait twice, a state that does not fit, or a possible-het chance
 * outside 0 to 100 % are refused before the request.
 */
export function toSetGenesRequest(
  rows: readonly GeneRow[],
  traits: readonly Pick<Trait, 'id' | 'name' | 'mode'>[],
): { genes: { traitId: number; state: GeneState; hetProbability?: number }[] } | string {
  const seen = new Set<number>();
  const genes: { traitId: number; state: GeneState; hetProbability?: number }[] = [];
  for (const row of rows) {
    if (row.traitId === null) continue;
    const trait = traits.find((t) => t.id === row.traitId);
    if (!trait) return 'Pick a trait from the list for every row.';
    if (seen.has(trait.id)) return `${trait.name} is listed twice.`;
    seen.add(trait.id);
    if (!statesFor(trait.mode).includes(row.state)) return `${trait.name} is ${trait.mode.replace('-', ' ')}: pick ${statesFor(trait.mode).map((s) => STATE_LABELS[s]).join(', ')}.`;
    if (row.state === 'possible-het') {
      const percent = Number(row.hetPercent);
      if (row.hetPercent.trim() === '' || !(percent > 0 && percent < 100)) return `${trait.name}: give the chance of het as a percentage between 0 and 100, e.g. 66.67.`;
      genes.push({ traitId: trait.id, state: 'possible-het', hetProbability: Math.round(percent * 100) / 10000 });
    } else {
      genes.push({ traitId: trait.id, state: row.state });
    }
  }
  return { genes };
}
