import { Router } from 'express';
import type { Knex } from 'knex';
import { ClutchListQuery, CreateClutchRequest, HatchRequest, UpdateClutchRequest } from '../../../../../shared/api/collection-breeding.js';
import { IdParams } from '../../../../../shared/api/common.js';
import type { InheritanceMode, PairingOutcomesResponse } from '../../../../../shared/api/genetics.js';
import { json } from '../../../../common/src/async-handler.js';
import { ConflictError, UnprocessableError, ValidationError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { insertId, nowIso } from '../../db/knex.js';
import type { CalculatorClient } from '../../lib/calculator-client.js';
import { KEEPERS } from '../shared/access.js';
import { assertNotFuture } from '../shared/dates.js';
import { expectedHatch } from './breeding-dates.js';
import { genesOf, morphLabel, outcomesRequest } from './genes-store.js';
import { hatchlingGenes, type DerivedGene } from './hatchling-genes.js';
import { findClutchRow, findPairing, listClutches, toClutch } from './pairings-store.js';

/** Clutches with their expected hatch, and the hatch that turns eggs into animals. */
export function clutchesRoutes(db: Knex, calculator: CalculatorClient): Router {
  const router = Router();
  const findClutch = async (id: number) => toClutch(await findClutchRow(db, id));

  router.get('/api/v1/clutches', allow(...KEEPERS), json(async (req) => listClutches(db, parseOrThrow(ClutchListQuery, req.query, 'query'))));
  router.get('/api/v1/clutches/:id', allow(...KEEPERS), json(async (req) => findClutch(parseOrThrow(IdParams, req.params).id)));

  router.post(
    '/api/v1/clutches',
    allow(...KEEPERS),
    json(async (req, res) => {
      const body = parseOrThrow(CreateClutchRequest, req.body);
      assertNotFuture(body.laidOn, 'laidOn');
      await findPairing(db, body.pairingId).catch(() => {
        throw new UnprocessableError(`No pairing with id ${body.pairingId}.`, 'pairingId');
      });
      const hatch = expectedHatch(body.laidOn, body.incubationTempF);
      const now = nowIso();
      const id = await db.transaction(async (trx) => {
        const clutchId = await insertId(trx('clutches'), {
          pairing_id: body.pairingId, laid_on: body.laidOn, fertile_eggs: body.fertileEggs, slugs: body.slugs, incubation_temp_f: body.incubationTempF,
          humidity_pct: body.humidityPct, expected_hatch_from: hatch.from, expected_hatch_to: hatch.to, notes: body.notes, created_at: now, updated_at: now,
        });
        await trx('pairings').where({ id: body.pairingId }).update({ status: 'laid', updated_at: now });
        return clutchId;
      });
      await audit(db, req.identity, 'create', 'clutch', id!, body);
      res.status(201);
      return findClutch(id!);
    }),
  );

  router.patch(
    '/api/v1/clutches/:id',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdateClutchRequest, req.body);
      const row = await findClutchRow(db, id);
      const change: Record<string, unknown> = { updated_at: nowIso() };
      if (body.fertileEggs !== undefined) change.fertile_eggs = body.fertileEggs;
      if (body.slugs !== undefined) change.slugs = body.slugs;
      if (body.humidityPct !== undefined) change.humidity_pct = body.humidityPct;
      if (body.notes !== undefined) change.notes = body.notes;
      if (body.incubationTempF !== undefined) change.incubation_temp_f = body.incubationTempF;
      await db('clutches').where({ id }).update(change);
      await audit(db, req.identity, 'update', 'clutch', id, body);
      return findClutch(row.id);
    }),
  );

  router.post(
    '/api/v1/clutches/:id/hatch',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(HatchRequest, req.body);
      assertNotFuture(body.hatchedOn, 'hatchedOn');
      const clutch = await findClutchRow(db, id);
      if (clutch.hatched_on) throw new ConflictError(`The clutch hatched on ${clutch.hatched_on} and its hatchlings are recorded.`);
      if (body.hatchedOn < clutch.laid_on) throw new ValidationError(`hatchedOn: the clutch was laid on ${clutch.laid_on}`, 'hatchedOn');
      if (body.hatchlings.length > clutch.fertile_eggs) throw new UnprocessableError(`The clutch has ${clutch.fertile_eggs} fertile egg(s), not ${body.hatchlings.length}.`, 'hatchlings');
      const codes = body.hatchlings.map((h) => h.code.toLowerCase());
      for (const [i, code] of codes.entries()) {
        if (codes.indexOf(code) !== i) throw new ValidationError(`hatchlings[${i}].code: listed twice`, `hatchlings[${i}].code`);
      }
      const taken = (await db('animals').whereRaw(`lower(code) in (${codes.map(() => '?').join(',')})`, codes).pluck('code')) as string[];
      if (taken.length) throw new ConflictError(`Code ${taken[0]} is in use.`, `hatchlings[${codes.indexOf(taken[0]!.toLowerCase())}].code`);

      const pairing = await findPairing(db, clutch.pairing_id);
      const dam = await db('animals').where({ id: pairing.dam.id }).first();
      const genes = await genesOf(db, [pairing.sire.id, pairing.dam.id]);
      const request = outcomesRequest(genes.get(pairing.sire.id)!, genes.get(pairing.dam.id)!);
      const outcomes = request ? await calculator.post<PairingOutcomesResponse>('/api/v1/genetics/pairing-outcomes', request, req.identity) : null;
      const traitRows = (await db('traits').whereIn('name', request?.traits.map((t) => t.name) ?? [])) as { id: number; name: string; mode: InheritanceMode }[];
      const names = new Map(traitRows.map((t) => [t.id, t.name]));
      const derived: DerivedGene[][] = body.hatchlings.map((h, i) => {
        const result = hatchlingGenes(traitRows, outcomes, h.looks, `hatchlings[${i}].looks`);
        if (!result.ok) throw new UnprocessableError(`${result.field}: ${result.message}`, result.field);
        return result.genes;
      });

      const now = nowIso();
      const created = await db.transaction(async (trx) => {
        const out = [];
        for (const [i, h] of body.hatchlings.entries()) {
          const morph = morphLabel(derived[i]!.map((g) => ({ trait: names.get(g.traitId)!, state: g.state, hetProbability: g.hetProbability })));
          const animalId = await insertId(trx('animals'), {
            code: h.code, name: h.name, species: dam.species, morph, sex: h.sex, hatch_date: body.hatchedOn, status: 'active',
            origin: 'bred', sire_id: pairing.sire.id, dam_id: pairing.dam.id, clutch_id: id, created_at: now, updated_at: now,
          });
          if (derived[i]!.length) {
            await trx('animal_genes').insert(derived[i]!.map((g) => ({ animal_id: animalId, trait_id: g.traitId, state: g.state, het_probability: g.hetProbability, created_at: now, updated_at: now })));
          }
          out.push({ id: animalId!, code: h.code });
        }
        await trx('clutches').where({ id }).update({ hatched_on: body.hatchedOn, hatchling_count: body.hatchlings.length, updated_at: now });
        return out;
      });
      await audit(db, req.identity, 'hatch', 'clutch', id, { hatchedOn: body.hatchedOn, animalIds: created.map((c) => c.id) });
      const createdGenes = await genesOf(db, created.map((c) => c.id));
      res.status(201);
      return { clutch: await findClutch(id), hatchlings: created.map((c) => ({ ...c, genes: createdGenes.get(c.id)! })) };
    }),
  );

  return router;
}
