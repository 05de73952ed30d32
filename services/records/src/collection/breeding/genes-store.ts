import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AnimalGene } from '../../../../../shared/api/collection-breeding.js';
import type { InheritanceMode, ParentGene, PairingOutcomesRequest } from '../../../../../shared/api/genetics.js';
import { UnprocessableError } from '../../../../common/src/errors.js';
import { nowIso } from '../../db/knex.js';

type Gene = z.infer<typeof AnimalGene>;

export async function genesOf(db: Knex, animalIds: number[]): Promise<Map<number, Gene[]>> {
  const rows = (await db('animal_genes as g')
    .join('traits as t', 't.id', 'g.trait_id')
    .whereIn('g.animal_id', animalIds)
    .orderBy(['g.animal_id', 't.name'])
    .select('g.animal_id', 'g.trait_id', 't.name', 't.mode', 'g.state', 'g.het_probability')) as { animal_id: number; trait_id: number; name: string; mode: InheritanceMode; state: Gene['state']; het_probability: number | null }[];
  const out = new Map<number, Gene[]>(animalIds.map((id) => [id, []]));
  for (const r of rows) out.get(r.animal_id)!.push({ traitId: r.trait_id, trait: r.name, mode: r.mode, state: r.state, hetProbability: r.het_probability });
  return out;
}

const STATES: Record<InheritanceMode, readonly string[]> = {
  recessive: ['het', 'visual', 'possible-het'],
  'incomplete-dominant': ['single', 'super'],
  dominant: ['single', 'super'],
};

/** Replaces an animal's genes; every state must fit its trait's mode. */
export async function setGenes(db: Knex, animalId: number, genes: { traitId: number; state: Gene['state']; hetProbability?: number | undefined }[]): Promise<void> {
  const traits = new Map(((await db('traits').whereIn('id', genes.map((g) => g.traitId))) as { id: number; name: string; mode: InheritanceMode }[]).map((t) => [t.id, t]));
  const seen = new Set<number>();
  for (const [i, gene] of genes.entries()) {
    const trait = traits.get(gene.traitId);
    if (!trait) throw new UnprocessableError(`No trait with id ${gene.traitId}.`, `genes[${i}].traitId`);
    if (seen.has(gene.traitId)) throw new UnprocessableError(`Trait ${trait.name} is listed twice.`, `genes[${i}].traitId`);
    seen.add(gene.traitId);
    if (!STATES[trait.mode].includes(gene.state)) throw new UnprocessableError(`"${gene.state}" does not fit the ${trait.mode} trait ${trait.name}; use ${STATES[trait.mode].join(', ')}.`, `genes[${i}].state`);
    if ((gene.state === 'possible-het') !== (gene.hetProbability !== undefined)) {
      throw new UnprocessableError('hetProbability goes with possible-het, and only with it.', `genes[${i}].hetProbability`);
    }
  }
  const now = nowIso();
  await db.transaction(async (trx) => {
    await trx('animal_genes').where({ animal_id: animalId }).delete();
    if (genes.length) {
      await trx('animal_genes').insert(genes.map((g) => ({ animal_id: animalId, trait_id: g.traitId, state: g.state, het_probability: g.hetProbability ?? null, created_at: now, updated_at: now })));
    }
  });
}

const asParentGene = (g: Gene): ParentGene =>
  g.state === 'possible-het' ? { state: 'possible-het', hetProbability: Math.round((g.hetProbability ?? 0) * 10000) / 10000 } : g.state;

/** The genetics request for two animals' recorded genes; null when neither carries anything. */
export function outcomesRequest(sireGenes: Gene[], damGenes: Gene[]): PairingOutcomesRequest | null {
  const traits = new Map<string, InheritanceMode>();
  for (const g of [...sireGenes, ...damGenes]) traits.set(g.trait, g.mode);
  if (traits.size === 0) return null;
  return {
    traits: [...traits].sort(([a], [b]) => a.localeCompare(b)).map(([name, mode]) => ({ name, mode })),
    sire: Object.fromEntries(sireGenes.map((g) => [g.trait, asParentGene(g)])),
    dam: Object.fromEntries(damGenes.map((g) => [g.trait, asParentGene(g)])),
  };
}

/** A label for the morph column keepers already read, e.g. "amber, het lattice, 67% possible het frost". */
export function morphLabel(genes: { trait: string; state: Gene['state']; hetProbability: number | null }[]): string {
  if (genes.length === 0) return 'normal';
  return genes
    .map((g) =>
      g.state === 'visual' || g.state === 'single'
        ? g.trait
        : g.state === 'possible-het'
          ? `${Math.round((g.hetProbability ?? 0) * 100)}% possible het ${g.trait}`
          : `${g.state} ${g.trait}`,
    )
    .join(', ');
}
