import type { InheritanceMode } from '../core/collection-types';

export const INHERITANCE_MODES: readonly InheritanceMode[] = ['recessive', 'incomplete-dominant', 'dominant'];

export const MODE_LABELS: Record<InheritanceMode, string> = {
  recessive: 'Recessive',
  'incomplete-dominant': 'Incomplete dominant',
  dominant: 'Dominant',
};

/** What each mode means, in keepers' words; the ratios are textbook Mendelian odds per egg. */
export const MODE_MEANINGS: Record<InheritanceMode, string> = {
  recessive:
    'Shows only with two copies (visual). An animal with one copy (het) looks normal but passes it on to about half its young. Het × het: about 1 in 4 young are visual, and 2 in 3 of the normal-looking ones are het.',
  'incomplete-dominant':
    'One copy shows (single); two copies show a stronger, different look (super). Single × normal: about half the young show it. Single × single: about 1 in 4 super, 2 in 4 single, 1 in 4 normal.',
  dominant:
    'One copy shows, and two copies (super) look the same as one; only breeding tells them apart. Single × normal: about half the young show it. A super passes it to every young.',
};
