import { RANGES } from './environment-rules.js';

/*
 * Species the shop has on record. Ranges only where they are common practice the shop keeps
 * (the ball python's, as the reading alerts use); no invented values for the others.
 */
export const SPECIES_ON_RECORD: readonly { name: string; commonName: string; ranges: { warmF: [number, number]; coolF: [number, number]; humidityPct: [number, number] } | null }[] = [
  { name: 'Python regius', commonName: 'ball python', ranges: { warmF: RANGES.warmF, coolF: RANGES.coolF, humidityPct: RANGES.humidityPct } },
  { name: 'Morelia spilota', commonName: 'carpet python', ranges: null },
  { name: 'Antaresia childreni', commonName: 'Children\'s python', ranges: null },
];

/** The ball python is always listed; other species of the record only while animals carry them. */
const ALWAYS_LISTED = 'python regius';

/**
 * The species list: every species animals carry (counted, names matched ignoring case and
 * surrounding spaces), with the record's common name and ranges where it has them, by name.
 */
export function speciesList(counts: readonly { name: string; count: number }[]) {
  const byKey = new Map<string, { name: string; animalCount: number }>();
  for (const { name, count } of counts) {
    const key = name.trim().toLowerCase();
    if (!key) continue;
    const entry = byKey.get(key);
    if (entry) entry.animalCount += count;
    else byKey.set(key, { name: name.trim(), animalCount: count });
  }
  const always = SPECIES_ON_RECORD.find((s) => s.name.toLowerCase() === ALWAYS_LISTED)!;
  if (!byKey.has(ALWAYS_LISTED)) byKey.set(ALWAYS_LISTED, { name: always.name, animalCount: 0 });
  return [...byKey]
    .map(([key, { name, animalCount }]) => {
      const known = SPECIES_ON_RECORD.find((s) => s.name.toLowerCase() === key);
      return { name: known?.name ?? name, commonName: known?.commonName ?? null, animalCount, ranges: known?.ranges ?? null };
    })
    .sort((a, b) => a.name.localeCompare(b.name));
}
