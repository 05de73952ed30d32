import type { HusbandryEvent } from '../core/collection-types';
import { describeEvent } from './event-text';

const base: HusbandryEvent = {
  id: 1, animalId: 1, animalCode: 'PR-001', kind: 'note', occurredAt: '2026-12-01T19:00:00.000Z', preyKind: null, preySize: null,
  preyMassG: null, result: null, weightG: null, shed: null, note: '', batchId: null, createdBy: 'keeper', createdAt: '2026-12-01T19:00:00.000Z',
};

describe('describeEvent', () => {
  it('says the result first, then the prey', () => {
    expect(describeEvent({ ...base, kind: 'feeding', result: 'refused', preyKind: 'rat', preySize: 'extra-large', preyMassG: 45 })).toBe('Refused · rat, extra large, 45 g');
    expect(describeEvent({ ...base, kind: 'feeding', result: 'accepted', preyKind: 'mouse' })).toBe('Accepted · mouse');
  });

  it('writes weights, sheds and notes', () => {
    expect(describeEvent({ ...base, kind: 'weight', weightG: 1240 })).toBe('1,240 g');
    expect(describeEvent({ ...base, kind: 'shed', shed: 'in-pieces', note: 'soaked' })).toBe('In pieces — soaked');
    expect(describeEvent({ ...base, kind: 'note', note: 'Moved to a bigger tub' })).toBe('Moved to a bigger tub');
    expect(describeEvent({ ...base, kind: 'cleaning' })).toBe('Cleaning');
  });
});
