import type { InheritanceMode, PairingOutcomesResponse } from '../../../../../shared/api/genetics.js';
import { LOOKS_BY_MODE } from '../../../../../shared/api/genetics.js';

export interface TraitRef {
  id: number;
  name: string;
  mode: InheritanceMode;
}

export interface DerivedGene {
  traitId: number;
  state: 'het' | 'visual' | 'single' | 'super' | 'possible-het';
  hetProbability: number | null;
}

export type GenesResult = { ok: true; genes: DerivedGene[] } | { ok: false; field: string; message: string };

/**
 * A hatchling's genes from what it shows and its parents' outcome tables: shown traits are taken
 * as they look; a normal-looking recessive trait is het, possible-het (with the table's chance) or
 * nothing. A dominant trait that shows is stored as `single` unless only the super form is possible
 * (the two look alike; a test breeding tells them apart).
 */
export function hatchlingGenes(traits: readonly TraitRef[], outcomes: PairingOutcomesResponse | null, looksGiven: Readonly<Record<string, string>>, field: string): GenesResult {
  const byName = new Map(traits.map((t) => [t.name, t]));
  for (const [name, state] of Object.entries(looksGiven)) {
    const trait = byName.get(name);
    if (!trait) return { ok: false, field: `${field}.${name}`, message: `neither parent carries "${name}"` };
    if (!(LOOKS_BY_MODE[trait.mode] as readonly string[]).includes(state)) {
      return { ok: false, field: `${field}.${name}`, message: `"${state}" does not fit the ${trait.mode} trait "${name}"; use ${LOOKS_BY_MODE[trait.mode].join(', ')}` };
    }
  }
  if (!outcomes || traits.length === 0) return { ok: true, genes: [] };
  const looks = Object.fromEntries(traits.map((t) => [t.name, looksGiven[t.name] ?? 'normal']));
  const row = outcomes.appearances.find((a) => traits.every((t) => a.looks[t.name] === looks[t.name]));
  if (!row) {
    const shown = Object.entries(looks).filter(([, s]) => s !== 'normal').map(([n, s]) => `${s} ${n}`);
    return { ok: false, field, message: `these parents cannot produce a hatchling that looks like ${shown.length ? shown.join(', ') : 'a normal'}` };
  }
  const genes: DerivedGene[] = [];
  for (const trait of traits) {
    const shows = looks[trait.name]!;
    if (trait.mode === 'recessive') {
      if (shows === 'visual') genes.push({ traitId: trait.id, state: 'visual', hetProbability: null });
      else {
        const chance = row.hetChance[trait.name] ?? 0;
        if (row.hetFraction[trait.name] === '1/1') genes.push({ traitId: trait.id, state: 'het', hetProbability: null });
        else if (chance > 0) genes.push({ traitId: trait.id, state: 'possible-het', hetProbability: chance });
      }
    } else if (trait.mode === 'incomplete-dominant') {
      if (shows !== 'normal') genes.push({ traitId: trait.id, state: shows as 'single' | 'super', hetProbability: null });
    } else if (shows !== 'normal') {
      const forms = new Set(outcomes.outcomes.map((o) => o.genotype[trait.name]).filter((s) => s !== 'normal'));
      genes.push({ traitId: trait.id, state: forms.size === 1 && forms.has('super') ? 'super' : 'single', hetProbability: null });
    }
  }
  return { ok: true, genes };
}
