import { FeedingGridState, GridTub, applyGridKey, countMarks, initialGridState, markTub, undo } from './feeding-grid-keys';

/*
 * A 3 x 3 rack (levels from the top, columns from the left); tub id = level * 10 + column.
 * Empty tubs: 1-2 and 3-1.
 *   11 [12] 13
 *   21  22  23
 *  [31] 32  33
 */
const EMPTY = new Set([12, 31]);
const tubs: GridTub[] = [];
for (const level of [3, 1, 2]) for (const column of [3, 1, 2]) tubs.push({ id: level * 10 + column, level, column, occupied: !EMPTY.has(level * 10 + column) });

const press = (state: FeedingGridState, ...keys: (string | { key: string; ctrlKey?: boolean; metaKey?: boolean; altKey?: boolean })[]) =>
  keys.reduce((s, k) => applyGridKey(s, tubs, typeof k === 'string' ? { key: k } : k).state, state);

describe('feeding grid keys', () => {
  const start = initialGridState(tubs);

  it('starts on the first tub with an animal in reading order', () => {
    expect(start).toEqual({ cursor: 11, marks: {}, history: [] });
    expect(initialGridState(tubs.map((t) => ({ ...t, occupied: t.id === 33 }))).cursor).toBe(33);
    expect(initialGridState(tubs.map((t) => ({ ...t, occupied: false }))).cursor).toBeNull();
  });

  it('marks with one key per tub and moves to the next animal, skipping empty tubs', () => {
    const state = press(start, 'a', 'R', 'o', 'g');
    expect(state.marks).toEqual({ 11: 'accepted', 13: 'refused', 21: 'offered', 22: 'regurgitated' });
    expect(state.cursor).toBe(23);
  });

  it('stays on the last animal when marking it', () => {
    const state = press({ ...start, cursor: 33 }, 'a');
    expect(state).toMatchObject({ cursor: 33, marks: { 33: 'accepted' } });
  });

  it('changes a mark in place with a second key', () => {
    const state = press(start, 'a', 'ArrowLeft', 'r');
    expect(state.marks).toEqual({ 11: 'refused' });
  });

  it('moves with the arrows to the nearest animal in that direction', () => {
    expect(press(start, 'ArrowRight').cursor).toBe(13); // jumps the empty 12
    expect(press(start, 'ArrowLeft').cursor).toBe(11); // nothing to the left: stays
    expect(press(start, 'ArrowUp').cursor).toBe(11);
    expect(press(start, 'ArrowDown').cursor).toBe(21);
    expect(press(start, 'ArrowDown', 'ArrowDown').cursor).toBe(32); // 31 is empty: closest column on level 3
    expect(press({ ...start, cursor: 22 }, 'ArrowUp').cursor).toBe(11); // 12 is empty: the left one of 11 and 13
    expect(press(start, 'End').cursor).toBe(33);
    expect(press({ ...start, cursor: 33 }, 'Home').cursor).toBe(11);
  });

  it('clears a mark with Delete, Backspace or 0, and undo brings it back', () => {
    const marked = press(start, 'a', 'ArrowLeft');
    const cleared = press(marked, 'Delete');
    expect(cleared.marks).toEqual({});
    expect(press(marked, 'Backspace').marks).toEqual({});
    expect(press(marked, '0').marks).toEqual({});
    expect(press(cleared, 'u').marks).toEqual({ 11: 'accepted' });
  });

  it('does not record a clear of an unmarked tub in the history', () => {
    const state = press(start, 'Delete');
    expect(state.history).toEqual([]);
  });

  it('undoes the last change with U or Ctrl+Z and returns the cursor to its tub', () => {
    const state = press(start, 'a', 'r');
    const once = press(state, 'u');
    expect(once).toMatchObject({ cursor: 13, marks: { 11: 'accepted' } });
    const twice = press(once, { key: 'z', ctrlKey: true });
    expect(twice).toMatchObject({ cursor: 11, marks: {} });
    expect(press(twice, { key: 'Z', metaKey: true })).toEqual(twice); // nothing left to undo
  });

  it('restores the previous mark, not just removes it', () => {
    const state = press(start, 'a', 'ArrowLeft', 'r', 'u');
    expect(state.marks).toEqual({ 11: 'accepted' });
  });

  it('leaves keys with modifiers and unknown keys to the page', () => {
    expect(applyGridKey(start, tubs, { key: 'a', ctrlKey: true }).handled).toBe(false);
    expect(applyGridKey(start, tubs, { key: 'r', altKey: true }).handled).toBe(false);
    expect(applyGridKey(start, tubs, { key: 'Tab' }).handled).toBe(false);
    expect(applyGridKey(start, tubs, { key: 'x' })).toEqual({ state: start, handled: false });
    expect(applyGridKey(start, tubs, { key: 'a' }).handled).toBe(true);
  });

  it('ignores every key when the rack has no animal', () => {
    const none = tubs.map((t) => ({ ...t, occupied: false }));
    const empty = initialGridState(none);
    expect(applyGridKey(empty, none, { key: 'a' })).toEqual({ state: empty, handled: false });
  });

  it('marks by pointer with the same undo', () => {
    const state = markTub(start, 22, 'refused');
    expect(state).toMatchObject({ cursor: 22, marks: { 22: 'refused' } });
    expect(undo(state).marks).toEqual({});
    expect(markTub(state, 22, 'refused').history).toHaveLength(1); // same mark again is no change
  });

  it('counts the marks by result', () => {
    expect(countMarks(press(start, 'a', 'a', 'r', 'g').marks)).toEqual({ accepted: 2, refused: 1, offered: 0, regurgitated: 1, total: 4 });
  });
});
