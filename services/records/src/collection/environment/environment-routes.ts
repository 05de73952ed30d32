import express, { Router } from 'express';
import type { Knex } from 'knex';
import { CALIBRATION_CAUTION, CreateReadingRequest, EnvironmentListQuery, ReadingUploadQuery } from '../../../../../shared/api/collection-environment.js';
import { json } from '../../../../common/src/async-handler.js';
import { UnprocessableError, ValidationError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { insertId, nowIso } from '../../db/knex.js';
import { listPage } from '../../lib/list.js';
import { findRack } from '../racks/racks-store.js';
import { KEEPERS, actorOf } from '../shared/access.js';
import { csvBody, parseCsv } from '../shared/csv.js';
import { assertNotFuture, toUtcIso } from '../shared/dates.js';
import { RANGES, readingAlerts, type Probe } from './environment-rules.js';
import { READING_COLUMNS, readLoggerRows } from './readings-csv.js';
import { fahrenheitToCelsius, roundTo } from './temperature.js';

type ReadingRow = { id: number; rack_id: number; taken_at: string; temp_f: number | null; humidity_pct: number | null; probe: Probe; source: 'manual' | 'csv' };
const toReading = (r: ReadingRow) => ({
  id: r.id,
  rackId: r.rack_id,
  takenAt: r.taken_at,
  tempF: r.temp_f,
  tempC: r.temp_f === null ? null : roundTo(fahrenheitToCelsius(r.temp_f), 2),
  humidityPct: r.humidity_pct,
  probe: r.probe,
  source: r.source,
  alerts: readingAlerts({ probe: r.probe, tempF: r.temp_f, humidityPct: r.humidity_pct }),
});

// The same ranges as readingAlerts, for filtering in the database.
function outsideRange(q: Knex.QueryBuilder) {
  const [wl, wh] = RANGES.warmF;
  const [cl, ch] = RANGES.coolF;
  const [hl, hh] = RANGES.humidityPct;
  return q.where((w) =>
    w
      .whereRaw(`(probe = 'warm' and (temp_f < ? or temp_f > ?))`, [wl, wh])
      .orWhereRaw(`(probe = 'cool' and (temp_f < ? or temp_f > ?))`, [cl, ch])
      .orWhereRaw('(humidity_pct < ? or humidity_pct > ?)', [hl, hh]),
  );
}

const CSV_LIMIT = '2mb';

/** Temperature and humidity per rack, by hand or from a data logger's CSV, with range alerts. */
export function environmentRoutes(db: Knex): Router {
  const router = Router();

  router.get('/api/v1/environment/ranges', allow(...KEEPERS), json(async () => RANGES));

  router.get(
    '/api/v1/environment-readings',
    allow(...KEEPERS),
    json(async (req) => {
      const query = parseOrThrow(EnvironmentListQuery, req.query, 'query');
      let rows = db('environment_readings');
      if (query.rackId) rows = rows.where({ rack_id: query.rackId });
      if (query.alertsOnly === 'true') rows = outsideRange(rows);
      const page = await listPage(rows, query, {
        columns: { takenAt: 'taken_at', tempF: 'temp_f', humidityPct: 'humidity_pct' },
        searchColumns: ['probe'],
        defaultSort: '-takenAt',
        toItem: toReading,
      });
      return { ...page, caution: CALIBRATION_CAUTION };
    }),
  );

  router.post(
    '/api/v1/environment-readings',
    allow(...KEEPERS),
    json(async (req, res) => {
      const body = parseOrThrow(CreateReadingRequest, req.body);
      assertNotFuture(body.takenAt, 'takenAt');
      await findRack(db, body.rackId).catch(() => {
        throw new UnprocessableError(`No rack with id ${body.rackId}.`, 'rackId');
      });
      const now = nowIso();
      const id = await insertId(db('environment_readings'), {
        rack_id: body.rackId, taken_at: toUtcIso(body.takenAt), temp_f: body.tempF, humidity_pct: body.humidityPct, probe: body.probe, source: 'manual', created_by: actorOf(req.identity), created_at: now, updated_at: now,
      });
      res.status(201);
      return toReading(await db('environment_readings').where({ id }).first());
    }),
  );

  // A logger export: every row is checked first, then all are written together or none.
  router.post(
    '/api/v1/environment-readings/upload',
    allow(...KEEPERS),
    express.text({ type: 'text/csv', limit: CSV_LIMIT }),
    json(async (req, res) => {
      const { rackId } = parseOrThrow(ReadingUploadQuery, req.query, 'query');
      const text = csvBody(req);
      await findRack(db, rackId);
      const { readings, errors } = readLoggerRows(parseCsv(text, READING_COLUMNS, ['takenAt']));
      if (errors.length) {
        const first = errors[0]!;
        throw new ValidationError(`Line ${first.row}, ${first.field}: ${first.message} (${errors.length} problem(s) in all; nothing was imported)`, `csv[${first.row}].${first.field}`, errors);
      }
      const now = nowIso();
      const actor = actorOf(req.identity);
      await db.transaction(async (trx) => {
        await trx.batchInsert(
          'environment_readings',
          readings.map((r) => ({ rack_id: rackId, taken_at: r.takenAt, temp_f: r.tempF, humidity_pct: r.humidityPct, probe: r.probe, source: 'csv', created_by: actor, created_at: now, updated_at: now })),
          200,
        );
      });
      await audit(db, req.identity, 'import', 'environment_readings', rackId, { rows: readings.length });
      res.status(201);
      return { rackId, imported: readings.length, alerts: readings.filter((r) => readingAlerts(r).length > 0).length, caution: CALIBRATION_CAUTION };
    }),
  );

  return router;
}
