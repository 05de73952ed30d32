import type { Access } from '../../../../common/src/roles.js';
import type { Identity } from '../../../../common/src/internal-identity.js';

/*
 * Who may use the collection: keepers and the owner read and write everything; sales read only
 * the animals offered for sale (and the trait names their genes use); builders nothing.
 */
export const KEEPERS: Access[] = ['owner', 'keeper'];
export const KEEPERS_AND_SALES: Access[] = ['owner', 'keeper', 'sales'];

/** The name written in created_by columns, as the audit log writes it. */
export const actorOf = (identity: Identity | undefined): string =>
  identity ? `${identity.kind}:${identity.email ?? identity.sub}` : 'system';
