import type { OrderStatus, QuoteStatus } from './orders-types';

/*
 * Mirrors of the API's status lists (shared/api/orders.ts) as plain values: importing the
 * schemas would put zod into the bundle. The API stays the judge of every move.
 */

export const QUOTE_STATUSES: readonly QuoteStatus[] = ['draft', 'sent', 'accepted', 'declined', 'expired'];

export const ORDER_STATUSES: readonly OrderStatus[] = [
  'awaiting_deposit', 'deposit_paid', 'cutting', 'assembly', 'wiring', 'testing', 'ready', 'delivered', 'picked_up', 'closed', 'cancelled',
];

/** Columns of the production board, in shop order: paid orders waiting to be cut, then each stage. */
export const BOARD_STAGES: readonly OrderStatus[] = ['deposit_paid', 'cutting', 'assembly', 'wiring', 'testing', 'ready'];

/** Stages a builder may enter (the API refuses the rest with 403). */
export const PRODUCTION_STAGES: readonly OrderStatus[] = ['cutting', 'assembly', 'wiring', 'testing', 'ready'];

const LABELS: Record<OrderStatus | QuoteStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  accepted: 'Accepted',
  declined: 'Declined',
  expired: 'Expired',
  awaiting_deposit: 'Awaiting deposit',
  deposit_paid: 'Deposit paid',
  cutting: 'Cutting',
  assembly: 'Assembly',
  wiring: 'Wiring',
  testing: 'Testing',
  ready: 'Ready',
  delivered: 'Delivered',
  picked_up: 'Picked up',
  closed: 'Closed',
  cancelled: 'Cancelled',
};

export function statusLabel(status: string): string {
  return (LABELS as Record<string, string>)[status] ?? status;
}

/** What the button that enters a stage says. */
export function moveLabel(stage: OrderStatus): string {
  switch (stage) {
    case 'cutting':
      return 'Start cutting';
    case 'ready':
      return 'Mark ready';
    case 'delivered':
      return 'Mark delivered';
    case 'picked_up':
      return 'Mark picked up';
    case 'closed':
      return 'Close order';
    case 'cancelled':
      return 'Cancel order';
    default:
      return `Move to ${statusLabel(stage).toLowerCase()}`;
  }
}

/** The production stage after `status` on the board, if any (ready hands over at the order page). */
export function nextBoardStage(status: OrderStatus): OrderStatus | null {
  const at = BOARD_STAGES.indexOf(status);
  return at >= 0 && at < BOARD_STAGES.length - 1 ? BOARD_STAGES[at + 1]! : null;
}

/** Colour family of a status chip. */
export function statusTone(status: string): 'neutral' | 'progress' | 'good' | 'warn' | 'bad' {
  if (['accepted', 'deposit_paid', 'ready', 'delivered', 'picked_up', 'closed', 'succeeded', 'paid'].includes(status)) return 'good';
  if (['cutting', 'assembly', 'wiring', 'testing', 'sent', 'open'].includes(status)) return 'progress';
  if (['awaiting_deposit', 'pending', 'expired'].includes(status)) return 'warn';
  if (['declined', 'cancelled', 'failed', 'canceled', 'void'].includes(status)) return 'bad';
  return 'neutral';
}
