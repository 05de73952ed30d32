/** The event a module element dispatches to ask the shell to change the address. */
export const NAVIGATE_EVENT = 'tw-navigate';

export interface NavigateDetail {
  /** The module's new sub-path, e.g. `animals/42` or `?q=tote`. */
  path: string;
  /** Replace the current history entry (typing in a filter) instead of adding one. */
  replace?: boolean;
}

export function navigateEvent(detail: NavigateDetail): CustomEvent<NavigateDetail> {
  // Bubbles and crosses shadow roots so the shell can listen on any ancestor.
  return new CustomEvent<NavigateDetail>(NAVIGATE_EVENT, { detail, bubbles: true, composed: true });
}
