import { PAIRING_OUTCOMES_EXAMPLE, PairingOutcomesRequest, PairingOutcomesResponse } from '../../../shared/api/genetics.js';
import { documentRoutes } from './route-catalog.js';

const PAIRING_OUTCOMES_DESCRIPTION = `Every offspring class of one pairing with its exact probability.

**Modes and states.** A trait is \`recessive\` (states \`normal\`, \`het\` = one copy, shows nothing; \`visual\` = two copies), \`incomplete-dominant\` (\`normal\`, \`single\` = one copy, visible; \`super\` = two copies, looks different again) or \`dominant\` (\`normal\`, \`single\`, \`super\`; the super form looks like the single form). A trait left out of a parent's map is \`normal\`. For a recessive trait a parent may be \`{ "state": "possible-het", "hetProbability": 0.5 }\`: het with that chance (at most four decimals, read exactly), otherwise normal.

**How it is computed.** Each parent passes one of its two copies of each gene, each with chance 1/2 (Mendel's law of segregation). Traits are assumed to be on different chromosomes, so they combine independently and the chance of a combination is the product of the chances per trait. All arithmetic is in exact fractions: \`fraction\` is reduced ("1/8", certainty is "1/1") and the fractions of each table add up to exactly 1; \`probability\` is the same value as a number.

**Tables.** \`outcomes\` lists every genotype class; \`appearances\` groups them by what the animal looks like and gives, for each recessive trait the class does not show, the chance that such an animal is het (\`hetChance\` rounded to 4 decimals, \`hetFraction\` exact): het x het gives 1/4 visual, and 2/3 of the normal-looking offspring are het. Both are sorted by probability, highest first, then by name.

**Errors.** 400 names the field (e.g. \`sire.amber\` for a trait that is not listed or a state that does not fit its mode, \`traits[2].name\` for a duplicate name). 422 when the table would have more than 6561 genotype classes (eight traits that each split three ways): ask for fewer traits at a time.`;

documentRoutes({
  method: 'post',
  path: '/api/v1/genetics/pairing-outcomes',
  tag: 'genetics',
  summary: 'Offspring genotypes and appearances of a pairing, exactly',
  description: PAIRING_OUTCOMES_DESCRIPTION,
  roles: ['owner', 'keeper', 'sales', 'integrator'],
  body: PairingOutcomesRequest,
  bodyExample: PAIRING_OUTCOMES_EXAMPLE,
  success: { status: 200, schema: PairingOutcomesResponse, description: 'Genotype and appearance tables' },
  errors: [422],
});
