/*
 * Feeding day's keyboard grid as pure state: one keystroke per tub. The component binds it to the
 * DOM; everything a key does is decided here, so it is tested without a browser.
 *
 *   A accepted · R refused · O offered (left in the tub) · G regurgitated → mark and go to the next animal
 *   arrows → the nearest tub with an animal in that direction · Home / End → first / last animal
 *   Delete, Backspace or 0 → clear the mark · U or Ctrl+Z → undo the last change (mark or clear)
 */

export type FeedingMark = 'accepted' | 'refused' | 'offered' | 'regurgitated';

export interface GridTub {
  id: number;
  level: number;
  column: number;
  /** Only tubs with an animal can be marked or take the cursor. */
  occupied: boolean;
}

export interface GridChange {
  tubId: number;
  previous: FeedingMark | null;
  /** Where the cursor was, so undo puts the keeper back on that tub. */
  cursor: number | null;
}

export interface FeedingGridState {
  /** Id of the tub with the cursor; null when the rack has no animal. */
  cursor: number | null;
  marks: Readonly<Record<number, FeedingMark>>;
  history: readonly GridChange[];
}

export interface KeyInput {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
}

export const MARK_KEYS: Readonly<Record<string, FeedingMark>> = { a: 'accepted', r: 'refused', o: 'offered', g: 'regurgitated' };
const CLEAR_KEYS = new Set(['Delete', 'Backspace', '0']);
const MAX_HISTORY = 500;

/** Tubs in reading order: top level first, left to right. */
export function inReadingOrder(tubs: readonly GridTub[]): GridTub[] {
  return [...tubs].sort((a, b) => a.level - b.level || a.column - b.column);
}

export function initialGridState(tubs: readonly GridTub[]): FeedingGridState {
  const first = inReadingOrder(tubs).find((t) => t.occupied);
  return { cursor: first?.id ?? null, marks: {}, history: [] };
}

/** The state after one key, and whether the key belonged to the grid (then the page must not also act on it). */
export function applyGridKey(state: FeedingGridState, tubs: readonly GridTub[], input: KeyInput): { state: FeedingGridState; handled: boolean } {
  const unhandled = { state, handled: false };
  const ordered = inReadingOrder(tubs).filter((t) => t.occupied);
  if (ordered.length === 0) return unhandled;
  const current = ordered.find((t) => t.id === state.cursor) ?? ordered[0]!;
  const withCursor = (tub: GridTub | undefined) => ({ state: tub ? { ...state, cursor: tub.id } : state, handled: true });

  if ((input.ctrlKey || input.metaKey) && !input.altKey && input.key.toLowerCase() === 'z') return { state: undo(state), handled: true };
  if (input.ctrlKey || input.metaKey || input.altKey) return unhandled;

  switch (input.key) {
    case 'ArrowLeft':
      return withCursor(nearest(ordered, current, (t) => t.level === current.level && t.column < current.column, (t) => current.column - t.column));
    case 'ArrowRight':
      return withCursor(nearest(ordered, current, (t) => t.level === current.level && t.column > current.column, (t) => t.column - current.column));
    case 'ArrowUp':
      return withCursor(nearestVertical(ordered, current, -1));
    case 'ArrowDown':
      return withCursor(nearestVertical(ordered, current, 1));
    case 'Home':
      return withCursor(ordered[0]);
    case 'End':
      return withCursor(ordered.at(-1));
  }

  const key = input.key.length === 1 ? input.key.toLowerCase() : input.key;
  if (key === 'u') return { state: undo(state), handled: true };
  const mark = MARK_KEYS[key];
  if (mark) {
    const next = ordered[ordered.indexOf(current) + 1] ?? current;
    return { state: { ...change(state, current.id, mark, current.id), cursor: next.id }, handled: true };
  }
  if (CLEAR_KEYS.has(key)) {
    if (!(current.id in state.marks)) return { state: { ...state, cursor: current.id }, handled: true };
    return { state: { ...change(state, current.id, null, current.id), cursor: current.id }, handled: true };
  }
  return unhandled;
}

/** Marks a tub by pointer (a click on a result button); same history as a keystroke. */
export function markTub(state: FeedingGridState, tubId: number, mark: FeedingMark | null): FeedingGridState {
  if ((state.marks[tubId] ?? null) === mark) return { ...state, cursor: tubId };
  return { ...change(state, tubId, mark, state.cursor), cursor: tubId };
}

export function undo(state: FeedingGridState): FeedingGridState {
  const last = state.history.at(-1);
  if (!last) return state;
  const marks = { ...state.marks };
  if (last.previous) marks[last.tubId] = last.previous;
  else delete marks[last.tubId];
  return { cursor: last.cursor ?? last.tubId, marks, history: state.history.slice(0, -1) };
}

/** Counts by result, for the summary line and the save button. */
export function countMarks(marks: Readonly<Record<number, FeedingMark>>): Record<FeedingMark, number> & { total: number } {
  const counts = { accepted: 0, refused: 0, offered: 0, regurgitated: 0, total: 0 };
  for (const mark of Object.values(marks)) {
    counts[mark]++;
    counts.total++;
  }
  return counts;
}

function change(state: FeedingGridState, tubId: number, mark: FeedingMark | null, cursor: number | null): FeedingGridState {
  const marks = { ...state.marks };
  const previous = marks[tubId] ?? null;
  if (mark) marks[tubId] = mark;
  else delete marks[tubId];
  const history = [...state.history, { tubId, previous, cursor }].slice(-MAX_HISTORY);
  return { ...state, marks, history };
}

function nearest(tubs: GridTub[], from: GridTub, inDirection: (t: GridTub) => boolean, distance: (t: GridTub) => number): GridTub {
  let best: GridTub | undefined;
  for (const t of tubs) if (inDirection(t) && (!best || distance(t) < distance(best))) best = t;
  return best ?? from;
}

/** Up and down go to the nearest level with an animal, to the tub closest to the column (the left one on a tie). */
function nearestVertical(tubs: GridTub[], from: GridTub, direction: 1 | -1): GridTub {
  const levels = tubs.filter((t) => (t.level - from.level) * direction > 0).map((t) => Math.abs(t.level - from.level));
  if (levels.length === 0) return from;
  const level = from.level + direction * Math.min(...levels);
  return nearest(tubs, from, (t) => t.level === level, (t) => Math.abs(t.column - from.column) * 2 + (t.column > from.column ? 1 : 0));
}
