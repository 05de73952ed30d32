import { refundAmountProblem, refundableCents } from './refunds';

describe('refundableCents', () => {
  it('takes refunds under way off what was paid, never below zero', () => {
    // paid 600.00 after earlier refunds; 150.00 asked and not yet confirmed; a failed one counts for nothing
    expect(refundableCents(60000, [{ amountCents: 15000, status: 'pending' }, { amountCents: 5000, status: 'failed' }, { amountCents: 10000, status: 'succeeded' }])).toBe(45000);
    expect(refundableCents(1000, [{ amountCents: 2000, status: 'pending' }])).toBe(0);
  });
});

describe('refundAmountProblem', () => {
  it('wants a positive amount of money no larger than what is refundable', () => {
    expect(refundAmountProblem('', 45000, 'usd')).toBe('Enter the amount to refund');
    expect(refundAmountProblem('12.345', 45000, 'usd')).toBe('Enter an amount like 250.00');
    expect(refundAmountProblem('0.00', 45000, 'usd')).toBe('Enter an amount above 0');
    expect(refundAmountProblem('450.01', 45000, 'usd')).toBe('At most $450.00 can be refunded');
    expect(refundAmountProblem('$450', 45000, 'usd')).toBeNull();
  });
});
