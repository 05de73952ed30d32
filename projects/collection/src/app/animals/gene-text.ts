import type { AnimalGene } from '../core/collection-types';
import { formatPercent } from '../core/format';

/** Keeper-style words for one gene: `het amber`, `66.7 % possible het amber`, `super dusk`, `frost`. */
export function geneLabel(gene: Pick<AnimalGene, 'trait' | 'state' | 'hetProbability'>): string {
  switch (gene.state) {
    case 'het':
      return `het ${gene.trait}`;
    case 'possible-het':
      return gene.hetProbability !== null ? `${formatPercent(gene.hetProbability)} possible het ${gene.trait}` : `possible het ${gene.trait}`;
    case 'super':
      return `super ${gene.trait}`;
    default:
      return gene.trait;
  }
}

/** Age from a hatch date, as keepers say it: `7 weeks`, `5 months`, `2 years 3 months`. */
export function ageText(hatchDate: string | null, today = new Date()): string {
  if (!hatchDate) return 'Unknown';
  const hatched = new Date(`${hatchDate}T00:00:00Z`);
  const days = Math.floor((today.getTime() - hatched.getTime()) / 86_400_000);
  if (Number.isNaN(days) || days < 0) return 'Not hatched yet';
  if (days < 14) return `${days} day${days === 1 ? '' : 's'}`;
  if (days < 91) return `${Math.floor(days / 7)} weeks`;
  const months = Math.floor(days / 30.4375);
  if (months < 24) return `${months} months`;
  const years = Math.floor(months / 12);
  const rest = months % 12;
  return rest ? `${years} years ${rest} month${rest === 1 ? '' : 's'}` : `${years} years`;
}
