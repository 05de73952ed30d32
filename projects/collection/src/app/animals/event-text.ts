import { formatGrams } from '../core/format';
import type { EventKind, FeedingResult, HusbandryEvent, PreySize, ShedQuality } from '../core/collection-types';

export const EVENT_KIND_LABELS: Record<EventKind, string> = {
  feeding: 'Feeding',
  weight: 'Weight',
  shed: 'Shed',
  cleaning: 'Cleaning',
  health: 'Health',
  note: 'Note',
};
export const EVENT_KINDS = Object.keys(EVENT_KIND_LABELS) as EventKind[];

export const FEEDING_RESULT_LABELS: Record<FeedingResult, string> = {
  accepted: 'Accepted',
  refused: 'Refused',
  offered: 'Offered (left in)',
  regurgitated: 'Regurgitated',
};
export const FEEDING_RESULTS = Object.keys(FEEDING_RESULT_LABELS) as FeedingResult[];

export const PREY_SIZES: readonly PreySize[] = ['pinky', 'fuzzy', 'hopper', 'weaned', 'small', 'medium', 'large', 'extra-large', 'jumbo'];
export const SHED_LABELS: Record<ShedQuality, string> = { complete: 'Complete, one piece', 'in-pieces': 'In pieces' };

/** One line saying what happened, e.g. `Refused · rat, small, 45 g` or `1,240 g`. */
export function describeEvent(event: HusbandryEvent): string {
  const parts: string[] = [];
  switch (event.kind) {
    case 'feeding': {
      const prey = [event.preyKind, event.preySize?.replace('-', ' '), event.preyMassG !== null ? formatGrams(event.preyMassG) : null].filter(Boolean).join(', ');
      parts.push([event.result ? FEEDING_RESULT_LABELS[event.result] : 'Fed', prey].filter(Boolean).join(' · '));
      break;
    }
    case 'weight':
      parts.push(formatGrams(event.weightG));
      break;
    case 'shed':
      parts.push(event.shed ? SHED_LABELS[event.shed] : 'Shed');
      break;
  }
  if (event.note) parts.push(event.note);
  return parts.join(' — ') || EVENT_KIND_LABELS[event.kind];
}
