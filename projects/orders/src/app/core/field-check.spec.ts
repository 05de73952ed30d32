import { HttpErrorResponse } from '@angular/common/http';
import { computed, signal } from '@angular/core';
import { FieldCheck, percentProblem, required, wholeProblem } from './field-check';

describe('FieldCheck', () => {
  const name = signal('');
  const check = new FieldCheck<'name' | 'deliveryFee'>({ name: required(name, 'Enter a name'), deliveryFee: computed(() => null) });

  it('stays quiet until the first save attempt, then names each problem', () => {
    expect(check.problem('name')).toBeNull();
    expect(check.ready()).toBe(false);
    expect(check.problem('name')).toBe('Enter a name');
    name.set('Greta');
    expect(check.problem('name')).toBeNull();
    expect(check.ready()).toBe(true);
  });

  it('puts the server’s word on the field it names, renamed where the API calls it otherwise', () => {
    const error = new HttpErrorResponse({ status: 400, error: { error: { code: 'invalid_input', message: 'is too large', field: 'deliveryFeeCents' } } });
    expect(check.placeServerError(error, { deliveryFeeCents: 'deliveryFee' })).toBe(true);
    expect(check.problem('deliveryFee')).toBe('is too large');
    check.edited('deliveryFee');
    expect(check.problem('deliveryFee')).toBeNull();
    const elsewhere = new HttpErrorResponse({ status: 409, error: { error: { code: 'conflict', message: 'taken', field: 'email' } } });
    expect(check.placeServerError(elsewhere)).toBe(false);
  });
});

describe('field rules', () => {
  it('takes percentages with at most two decimals up to 100', () => {
    expect(percentProblem('6.5')).toBeNull();
    expect(percentProblem('7.25')).toBeNull();
    expect(percentProblem('100')).toBeNull();
    expect(percentProblem('100.5')).not.toBeNull();
    expect(percentProblem('7.125')).not.toBeNull();
    expect(percentProblem('-1')).not.toBeNull();
  });

  it('takes whole numbers within bounds', () => {
    expect(wholeProblem('30', 1, 365, 'days')).toBeNull();
    expect(wholeProblem('0', 1, 365, 'days')).toBe('Enter whole days from 1 to 365');
    expect(wholeProblem('2.5', 0, 365, 'days')).not.toBeNull();
  });
});
