import { describe, expect, it } from 'vitest';
import { checkBulkEntries, eventPayload, rowToEvent } from './event-rules.js';

describe('husbandry event rules', () => {
  it('keeps kind-specific fields in the payload and reads them back, other fields null', () => {
    const payload = eventPayload({ kind: 'weight', occurredAt: '2026-12-01T10:00:00Z', weightG: 412, note: '' });
    expect(payload).toEqual({ weightG: 412, note: '' });
    const event = rowToEvent({ id: 1, animal_id: 2, animal_code: 'PR-002', kind: 'weight', occurred_at: '2026-12-01T10:00:00.000Z', payload_json: JSON.stringify(payload), batch_id: null, created_by: 'user:k', created_at: 'x' });
    expect(event).toMatchObject({ kind: 'weight', weightG: 412, result: null, preyKind: null, shed: null, note: '' });
  });

  it('checks a rack entry: tub once, in the rack, occupied', () => {
    const tubs = new Map<number, number | null>([[1, 10], [2, null], [3, 30]]);
    expect(checkBulkEntries([{ tubId: 1 }, { tubId: 3 }], tubs)).toBeNull();
    expect(checkBulkEntries([{ tubId: 1 }, { tubId: 1 }], tubs)).toEqual({ field: 'entries[1].tubId', message: 'tub 1 is listed twice' });
    expect(checkBulkEntries([{ tubId: 9 }], tubs)?.field).toBe('entries[0].tubId');
    expect(checkBulkEntries([{ tubId: 3 }, { tubId: 2 }], tubs)).toEqual({ field: 'entries[1].tubId', message: 'tub 2 is empty' });
  });
});
