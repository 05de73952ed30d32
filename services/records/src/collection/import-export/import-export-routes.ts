import express, { Router, type Response } from 'express';
import type { Knex } from 'knex';
import { EventExportQuery } from '../../../../../shared/api/collection-husbandry.js';
import { json } from '../../../../common/src/async-handler.js';
import { UnprocessableError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { insertId, nowIso } from '../../db/knex.js';
import { rowToEvent, type EventRow } from '../husbandry/event-rules.js';
import { KEEPERS } from '../shared/access.js';
import { csvBody, parseCsv, toCsv } from '../shared/csv.js';
import { addDays } from '../shared/dates.js';
import { ANIMAL_CSV_COLUMNS, ANIMAL_CSV_REQUIRED, checkAnimalRows } from './animal-import.js';

const EVENT_CSV_COLUMNS = ['id', 'animalCode', 'kind', 'occurredAt', 'preyKind', 'preySize', 'preyMassG', 'result', 'weightG', 'shed', 'note', 'createdBy'] as const;
const CSV_LIMIT = '2mb';

const sendCsv = (res: Response, fileName: string, text: string) => {
  res.type('text/csv; charset=utf-8').attachment(fileName).send(text);
};

/** Animals in and out as CSV, and the event log out; an import is all or nothing. */
export function importExportRoutes(db: Knex): Router {
  const router = Router();
  const csvText = express.text({ type: 'text/csv', limit: CSV_LIMIT });

  const check = async (text: string) => {
    const rows = parseCsv(text, ANIMAL_CSV_COLUMNS, ANIMAL_CSV_REQUIRED);
    const taken = new Set(((await db('animals').pluck('code')) as string[]).map((c) => c.toLowerCase()));
    return { rowCount: rows.length, ...checkAnimalRows(rows, taken) };
  };

  router.post(
    '/api/v1/collection/animals/import/preview',
    allow(...KEEPERS),
    csvText,
    json(async (req) => {
      const result = await check(csvBody(req));
      return {
        ok: result.errors.length === 0,
        rowCount: result.rowCount,
        errors: result.errors,
        animals: result.animals.map(({ row, animal }) => ({ row, code: animal.code, name: animal.name, species: animal.species })),
      };
    }),
  );

  router.post(
    '/api/v1/collection/animals/import',
    allow(...KEEPERS),
    csvText,
    json(async (req, res) => {
      const result = await check(csvBody(req));
      if (result.errors.length) {
        const first = result.errors[0]!;
        throw new UnprocessableError(`Line ${first.row}, ${first.field}: ${first.message}. ${result.errors.length} problem(s); nothing was imported. Check the file with the preview.`, `csv[${first.row}].${first.field}`);
      }
      const now = nowIso();
      const ids = await db.transaction(async (trx) => {
        const out: number[] = [];
        for (const { animal } of result.animals) {
          const { hatchDate, weightG, acquiredFrom, forSale, feedingIntervalDays, ...rest } = animal;
          const id = await insertId(trx('animals'), { ...rest, hatch_date: hatchDate, weight_g: weightG, acquired_from: acquiredFrom, for_sale: forSale, feeding_interval_days: feedingIntervalDays, created_at: now, updated_at: now });
          out.push(id!);
        }
        return out;
      });
      await audit(db, req.identity, 'import', 'animals', null, { count: ids.length });
      res.status(201);
      return { imported: ids.length, ids };
    }),
  );

  router.get('/api/v1/collection/animals.csv', allow(...KEEPERS), async (_req, res) => {
    const rows = (await db('animals').whereNull('deleted_at').orderBy('code')) as Record<string, unknown>[];
    const items = rows.map((r) => ({
      code: r.code, name: r.name, species: r.species, morph: r.morph, sex: r.sex, hatchDate: r.hatch_date, weightG: r.weight_g, status: r.status, notes: r.notes,
      origin: r.origin, acquiredFrom: r.acquired_from, forSale: r.for_sale ? 'yes' : 'no', feedingIntervalDays: r.feeding_interval_days,
    }));
    // The same columns the import reads, so an export can be edited and imported elsewhere.
    sendCsv(res, 'animals.csv', toCsv(ANIMAL_CSV_COLUMNS, items));
  });

  router.get('/api/v1/collection/events.csv', allow(...KEEPERS), async (req, res) => {
    const query = parseOrThrow(EventExportQuery, req.query, 'query');
    let q = db('events as e')
      .join('animals as a', 'a.id', 'e.animal_id')
      .whereNull('e.deleted_at')
      .select('e.id', 'e.animal_id', 'a.code as animal_code', 'e.kind', 'e.occurred_at', 'e.payload_json', 'e.batch_id', 'e.created_by', 'e.created_at')
      .orderBy([{ column: 'e.occurred_at' }, { column: 'e.id' }]);
    if (query.from) q = q.where('e.occurred_at', '>=', `${query.from}T00:00:00.000Z`);
    if (query.to) q = q.where('e.occurred_at', '<', `${addDays(query.to, 1)}T00:00:00.000Z`);
    if (query.kind) q = q.where('e.kind', query.kind);
    const events = ((await q) as EventRow[]).map(rowToEvent);
    sendCsv(res, 'events.csv', toCsv(EVENT_CSV_COLUMNS, events));
  });

  return router;
}
