import { formatLength, LengthPipe } from './length';

describe('formatLength', () => {
  it('shows inches as a reduced fraction to 1/16', () => {
    expect(formatLength(34.125)).toBe('34 1/8 in');
    expect(formatLength(16.5625)).toBe('16 9/16 in');
    expect(formatLength(0.5)).toBe('1/2 in');
    expect(formatLength(12)).toBe('12 in');
  });

  it('rounds to the nearest sixteenth', () => {
    // 6.03 in is 96.48/16, nearest tick 96/16 = 6.
    expect(formatLength(6.03)).toBe('6 in');
    expect(formatLength(6.04)).toBe('6 1/16 in');
  });

  it('shows millimetres when asked', () => {
    // 34 1/8 in × 25.4 mm/in = 866.775 mm (international inch).
    expect(formatLength(34.125, 'mm')).toBe('866.8 mm');
  });

  it('shows a dash for a missing value', () => {
    expect(formatLength(null)).toBe('—');
    expect(formatLength(undefined)).toBe('—');
    expect(formatLength(Number.NaN)).toBe('—');
  });

  it('is available as the `length` pipe', () => {
    expect(new LengthPipe().transform(4.25)).toBe('4 1/4 in');
  });
});
