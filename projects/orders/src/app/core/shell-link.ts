/** Links within this module: the kit's directive; `MODULE_BASE` for absolute links (QR labels). */
export { ShellLink } from '@tubwright/kit';
export const MODULE_BASE = '/orders';
