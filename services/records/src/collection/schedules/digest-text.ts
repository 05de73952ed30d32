import type { DueAnimal } from '../../../../../shared/api/collection-schedules.js';

type Due = { date: string; total: number; racks: { rackName: string; animals: DueAnimal[] }[]; unplaced: DueAnimal[] };

const flags = (a: DueAnimal): string => {
  const out = [];
  if (a.refusalFlag) out.push(`refused ${a.refusalStreak} in a row`);
  if (a.weightLossFlag) out.push(`lost ${a.weightLossPct} % weight`);
  return out.length ? `  ⚑ ${out.join('; ')}` : '';
};

const line = (a: DueAnimal): string => {
  const where = a.tubLabel ?? 'no tub';
  const prey = a.suggestedPreyMassG ? `, prey about ${a.suggestedPreyMassG} g` : '';
  const overdue = a.daysOverdue > 0 ? `, ${a.daysOverdue} day(s) overdue` : '';
  return `  ${where}  ${a.code}${a.name ? ` (${a.name})` : ''}${prey}${overdue}${flags(a)}`;
};

/** The plain-text daily digest: who is due, rack by rack, with the animals to watch first. */
export function digestText(due: Due): { subject: string; text: string; flagged: number } {
  const all = [...due.racks.flatMap((r) => r.animals), ...due.unplaced];
  const flagged = all.filter((a) => a.refusalFlag || a.weightLossFlag);
  const parts = [`Feeding day ${due.date}: ${due.total} animal(s) due.`, ''];
  if (flagged.length) parts.push('Watch these:', ...flagged.map(line), '');
  for (const rack of due.racks) parts.push(`Rack ${rack.rackName} (${rack.animals.length})`, ...rack.animals.map(line), '');
  if (due.unplaced.length) parts.push(`Not in a tub (${due.unplaced.length})`, ...due.unplaced.map(line), '');
  if (due.total === 0) parts.push('Nobody is due today.');
  return { subject: `Feeding due ${due.date}: ${due.total} animal(s)${flagged.length ? `, ${flagged.length} to watch` : ''}`, text: parts.join('\n'), flagged: flagged.length };
}
