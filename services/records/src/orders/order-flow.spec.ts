import { describe, expect, it } from 'vitest';
import { ORDER_STATUSES } from '../../../../shared/api/orders.js';
import { checkStageChange, isProductionStage, nextStages } from './order-flow.js';

describe('order lifecycle', () => {
  it('runs the production stages in the shop order after the deposit', () => {
    const path = ['deposit_paid', 'cutting', 'assembly', 'wiring', 'testing', 'ready', 'delivered', 'closed'] as const;
    for (let i = 1; i < path.length; i++) expect(checkStageChange({ status: path[i - 1]!, balanceCents: 0 }, path[i]!)).toBeNull();
  });

  it('refuses delivery before the deposit and names what is allowed', () => {
    expect(checkStageChange({ status: 'awaiting_deposit', balanceCents: 100 }, 'delivered')).toEqual({ reason: 'out_of_order', allowed: ['cancelled'] });
    expect(checkStageChange({ status: 'cutting', balanceCents: 100 }, 'testing')).toEqual({ reason: 'out_of_order', allowed: ['assembly', 'cancelled'] });
  });

  it('does not close an order with money owed', () => {
    expect(checkStageChange({ status: 'picked_up', balanceCents: 2500 }, 'closed')).toEqual({ reason: 'balance_due', balanceCents: 2500 });
  });

  it('lets every open stage cancel and no finished one', () => {
    for (const status of ORDER_STATUSES) {
      const open = !['delivered', 'picked_up', 'closed', 'cancelled'].includes(status);
      expect(nextStages(status).includes('cancelled'), status).toBe(open);
    }
  });

  it('keeps delivery and cancelling out of the builder\'s stages', () => {
    expect(isProductionStage('assembly')).toBe(true);
    expect(isProductionStage('delivered')).toBe(false);
    expect(isProductionStage('cancelled')).toBe(false);
  });
});
