import type { AnimalGene, InheritanceMode, LooksState, PairingOutcomes, Trait } from '../core/collection-types';
import { geneLabel } from '../animals/gene-text';

/** What a hatchling can show per mode (shared/api/genetics.ts LOOKS_BY_MODE; copied to keep zod out of the bundle). */
export const LOOKS_BY_MODE: Record<InheritanceMode, readonly LooksState[]> = {
  recessive: ['normal', 'visual'],
  'incomplete-dominant': ['normal', 'single', 'super'],
  dominant: ['normal', 'visual'],
};

export const LOOKS_LABELS: Record<LooksState, string> = { normal: 'normal', visual: 'shows it', single: 'single', super: 'super' };

export interface TracedTrait {
  name: string;
  mode: InheritanceMode;
}

/** The traits the parents' outcome tables follow, with their modes from the shop's list. */
export function tracedTraits(outcomes: PairingOutcomes | null, traits: readonly Pick<Trait, 'name' | 'mode'>[]): TracedTrait[] {
  const first = outcomes?.appearances[0];
  if (!first) return [];
  return Object.keys(first.looks)
    .sort((a, b) => a.localeCompare(b))
    .map((name) => {
      const mode = traits.find((t) => t.name === name)?.mode;
      // A trait the list does not know (renamed meanwhile): its looks in the table still tell recessive from the rest.
      const seen = new Set(outcomes!.appearances.map((a) => a.looks[name]));
      return { name, mode: mode ?? (seen.has('single') || seen.has('super') ? 'incomplete-dominant' : 'recessive') };
    });
}

/** Hatchling codes: `C4-01`, `C4-02`, … (two digits at least, so they sort). */
export function hatchlingCode(prefix: string, n: number): string {
  return `${prefix}${String(n).padStart(2, '0')}`;
}

/**
 * The genes the records service will give a hatchling that looks like `looks` (traits left out
 * look normal), from the parents' appearance table: shown traits as they look, normal-looking
 * recessive traits het or possible het with the table's chance. null when these parents cannot
 * produce that look (the service refuses it). Mirrors services/records hatchling-genes.ts.
 */
export function expectedGenes(outcomes: PairingOutcomes | null, traits: readonly TracedTrait[], looks: Readonly<Record<string, LooksState>>): string[] | null {
  if (!outcomes || traits.length === 0) return [];
  const shown = (name: string) => looks[name] ?? 'normal';
  const row = outcomes.appearances.find((a) => traits.every((t) => a.looks[t.name] === shown(t.name)));
  if (!row) return null;
  const genes: Pick<AnimalGene, 'trait' | 'state' | 'hetProbability'>[] = [];
  for (const t of traits) {
    const state = shown(t.name);
    if (t.mode === 'recessive') {
      if (state === 'visual') genes.push({ trait: t.name, state: 'visual', hetProbability: null });
      else if (row.hetFraction[t.name] === '1/1') genes.push({ trait: t.name, state: 'het', hetProbability: null });
      else if ((row.hetChance[t.name] ?? 0) > 0) genes.push({ trait: t.name, state: 'possible-het', hetProbability: row.hetChance[t.name]! });
    } else if (t.mode === 'incomplete-dominant') {
      if (state !== 'normal') genes.push({ trait: t.name, state: state === 'super' ? 'super' : 'single', hetProbability: null });
    } else if (state !== 'normal') {
      // A dominant super looks like its single: single unless these parents give only supers.
      const forms = new Set(outcomes.outcomes.map((o) => o.genotype[t.name]).filter((s) => s !== 'normal'));
      genes.push({ trait: t.name, state: forms.size === 1 && forms.has('super') ? 'super' : 'single', hetProbability: null });
    }
  }
  return genes.map(geneLabel);
}

/** The looks to send: only traits that show (the service reads a trait left out as normal). */
export function looksToSend(looks: Readonly<Record<string, LooksState>>): Record<string, LooksState> {
  return Object.fromEntries(Object.entries(looks).filter(([, state]) => state !== 'normal'));
}

/** `hatchlings[2].code` → { index: 2, field: 'code' }; `hatchlings[0].looks.amber` → looks of row 0. */
export function hatchlingField(field: string | undefined): { index: number; field: string } | null {
  const match = /^hatchlings\[(\d+)\](?:\.(\w+))?/.exec(field ?? '');
  return match ? { index: Number(match[1]), field: match[2] ?? '' } : null;
}
