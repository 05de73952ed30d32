import { PRODUCTION_STAGES, type OrderStatus } from '../../../../shared/api/orders.js';

/**
 * The order lifecycle. The deposit moves an order out of awaiting_deposit (only the provider's
 * signed event does that); production runs in the shop's order; cancelling is possible from any
 * open stage; closing needs the balance paid.
 */
const NEXT: Record<OrderStatus, readonly OrderStatus[]> = {
  awaiting_deposit: ['cancelled'],
  deposit_paid: ['cutting', 'cancelled'],
  cutting: ['assembly', 'cancelled'],
  assembly: ['wiring', 'cancelled'],
  wiring: ['testing', 'cancelled'],
  testing: ['ready', 'cancelled'],
  ready: ['delivered', 'picked_up', 'cancelled'],
  delivered: ['closed'],
  picked_up: ['closed'],
  closed: [],
  cancelled: [],
};

export function nextStages(status: OrderStatus): readonly OrderStatus[] {
  return NEXT[status];
}

export type StageRefusal = { reason: 'out_of_order'; allowed: readonly OrderStatus[] } | { reason: 'balance_due'; balanceCents: number };

/** Null when the move is allowed. */
export function checkStageChange(order: { status: OrderStatus; balanceCents: number }, to: OrderStatus): StageRefusal | null {
  const allowed = NEXT[order.status];
  if (!allowed.includes(to)) return { reason: 'out_of_order', allowed };
  if (to === 'closed' && order.balanceCents > 0) return { reason: 'balance_due', balanceCents: order.balanceCents };
  return null;
}

export function isProductionStage(stage: OrderStatus): boolean {
  return (PRODUCTION_STAGES as readonly OrderStatus[]).includes(stage);
}

/** Stages that tell the customer something: each sends one e-mail. */
export const CUSTOMER_NOTICES: Partial<Record<OrderStatus, 'order_ready' | 'order_delivered'>> = {
  ready: 'order_ready',
  delivered: 'order_delivered',
  picked_up: 'order_delivered',
};
