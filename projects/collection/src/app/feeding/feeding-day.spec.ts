import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import type { DueList, EventBatch, RackMap } from '../core/collection-types';
import { FeedingDay } from './feeding-day';

const occupant = (animalId: number, code: string) => ({ animalId, code, name: '', species: 'Python regius', since: '2026-11-01T09:00:00.000Z' });
const tub = (id: number, column: number, who: ReturnType<typeof occupant> | null) => ({ id, rackId: 1, rackName: 'R9', level: 1, column, label: `R9-1${'ABC'[column - 1]}`, occupant: who });
const RACK: RackMap = {
  id: 1, name: 'R9', levels: 1, columns: 3, planId: null, location: '', notes: '', tubCount: 3, occupiedCount: 2, createdAt: '2026-11-01T09:00:00.000Z',
  tubs: [tub(11, 1, occupant(101, 'PR-101')), tub(12, 2, null), tub(13, 3, occupant(103, 'PR-103'))],
};
const DUE: DueList = { date: '2026-12-02', total: 0, racks: [], unplaced: [] };

describe('FeedingDay', () => {
  let http: HttpTestingController;

  async function open() {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
    http = TestBed.inject(HttpTestingController);
    const fixture = TestBed.createComponent(FeedingDay);
    fixture.componentRef.setInput('rackId', 1);
    // Not whenStable(): the resources' open requests keep the fixture busy until flushed.
    TestBed.tick();
    http.expectOne('/api/v1/racks/1').flush(RACK);
    http.expectOne('/api/v1/feeding/due').flush(DUE);
    await fixture.whenStable();
    const root = fixture.nativeElement as HTMLElement;
    const grid = root.querySelector<HTMLElement>('[role="grid"]')!;
    const key = async (k: string, init: KeyboardEventInit = {}) => {
      grid.dispatchEvent(new KeyboardEvent('keydown', { key: k, bubbles: true, cancelable: true, ...init }));
      await fixture.whenStable();
    };
    const cell = (id: number) => root.querySelector<HTMLElement>(`[data-tub-id="${id}"]`)!;
    const button = (text: string) => Array.from(root.querySelectorAll('button')).find((b) => b.textContent?.includes(text))!;
    return { fixture, root, key, cell, button };
  }

  afterEach(() => http.verify());

  it('marks one tub per keystroke, skipping the empty tub, and undoes with U', async () => {
    const { key, cell, root } = await open();
    expect(cell(11).getAttribute('tabindex')).toBe('0');

    await key('a');
    expect(cell(11).getAttribute('aria-label')).toBe('R9-1A, PR-101, not due, Accepted');
    expect(cell(13).getAttribute('tabindex')).toBe('0'); // the empty R9-1B is skipped
    await key('r');
    expect(cell(13).classList).toContain('mark-refused');
    await key('u');
    expect(cell(13).getAttribute('aria-label')).toMatch(/not marked$/);
    expect(root.textContent).toContain('1 accepted · 0 refused');
  });

  it('saves the marks as one entry with an Idempotency-Key, and can undo the entry', async () => {
    const { key, button, fixture, root } = await open();
    await key('a');
    await key('r');
    button('Save 2 results').click();

    const post = http.expectOne('/api/v1/racks/1/feeding');
    expect(post.request.method).toBe('POST');
    expect(post.request.headers.get('Idempotency-Key')).toMatch(/\S{8,}/);
    expect(post.request.body).toMatchObject({
      preyKind: 'rat',
      entries: [
        { tubId: 11, result: 'accepted' },
        { tubId: 13, result: 'refused' },
      ],
    });
    const event = (id: number, animalId: number, result: 'accepted' | 'refused') => ({
      id, animalId, animalCode: '', kind: 'feeding' as const, occurredAt: '2026-12-02T18:00:00.000Z', preyKind: 'rat', preySize: null, preyMassG: null,
      result, weightG: null, shed: null, note: '', batchId: 9, createdBy: 'keeper', createdAt: '2026-12-02T18:00:00.000Z',
    });
    const batch: EventBatch = { id: 9, rackId: 1, kind: 'feeding', occurredAt: '2026-12-02T18:00:00.000Z', eventCount: 2, undoneAt: null, events: [event(1, 101, 'accepted'), event(2, 103, 'refused')] };
    post.flush(batch);
    TestBed.tick();
    http.expectOne('/api/v1/racks/1').flush(RACK);
    http.expectOne('/api/v1/feeding/due').flush(DUE);
    await fixture.whenStable();
    expect(root.textContent).toContain('Saved 2 results for rack R9: 1 accepted, 1 refused.');
    expect(root.querySelector('[data-tub-id="11"]')!.getAttribute('aria-label')).toContain('saved accepted');

    button('Undo this entry').click();
    const undo = http.expectOne('/api/v1/event-batches/9');
    expect(undo.request.method).toBe('DELETE');
    undo.flush({ ...batch, undoneAt: '2026-12-02T18:05:00.000Z' });
    TestBed.tick();
    http.expectOne('/api/v1/feeding/due').flush(DUE);
    await fixture.whenStable();
    expect(root.textContent).toContain('was undone');
  });

  it('does not send an empty entry', async () => {
    const { button } = await open();
    expect(button('Save 0 results').disabled).toBe(true);
  });
});
