import type { CreateEventRequest, HusbandryEvent } from '../../../../../shared/api/collection-husbandry.js';

/** Fields kept in payload_json per kind; everything but kind and time. */
export function eventPayload(event: CreateEventRequest): Record<string, unknown> {
  const { kind: _kind, occurredAt: _at, ...payload } = event;
  return payload;
}

export interface EventRow {
  id: number;
  animal_id: number;
  animal_code: string;
  kind: HusbandryEvent['kind'];
  occurred_at: string;
  payload_json: string;
  batch_id: number | null;
  created_by: string;
  created_at: string;
}

export function rowToEvent(row: EventRow): HusbandryEvent {
  const p = JSON.parse(row.payload_json) as Record<string, unknown>;
  const pick = <T>(key: string): T | null => (p[key] === undefined ? null : (p[key] as T));
  return {
    id: row.id,
    animalId: row.animal_id,
    animalCode: row.animal_code,
    kind: row.kind,
    occurredAt: row.occurred_at,
    preyKind: pick('preyKind'),
    preySize: pick('preySize'),
    preyMassG: pick('preyMassG'),
    result: pick('result'),
    weightG: pick('weightG'),
    shed: pick('shed'),
    note: (p.note as string | undefined) ?? '',
    batchId: row.batch_id,
    createdBy: row.created_by,
    createdAt: row.created_at,
  };
}

/** A rack's feeding entry: each tub at most once, every tub in the rack and occupied. */
export function checkBulkEntries(
  entries: readonly { tubId: number }[],
  occupantByTub: ReadonlyMap<number, number | null>,
): { field: string; message: string } | null {
  const seen = new Set<number>();
  for (const [i, entry] of entries.entries()) {
    const field = `entries[${i}].tubId`;
    if (seen.has(entry.tubId)) return { field, message: `tub ${entry.tubId} is listed twice` };
    seen.add(entry.tubId);
    if (!occupantByTub.has(entry.tubId)) return { field, message: `tub ${entry.tubId} is not in this rack` };
    if (occupantByTub.get(entry.tubId) === null) return { field, message: `tub ${entry.tubId} is empty` };
  }
  return null;
}
