import { lengthInputText, lengthProblem, readLengthIn } from './length-text';

describe('readLengthIn', () => {
  it('reads inches with fractions or decimals', () => {
    expect(readLengthIn('79 1/2')).toBe(79.5);
    expect(readLengthIn('79.5 in')).toBe(79.5);
    expect(readLengthIn('80"')).toBe(80);
  });

  it('reads feet and inches as a tape shows them', () => {
    // 6 ft 8 in = 80 in, a common interior door height (from memory)
    expect(readLengthIn(`6' 8"`)).toBe(80);
    expect(readLengthIn('6 ft 8 1/2 in')).toBe(80.5);
    expect(readLengthIn('8 ft')).toBe(96);
  });

  it('reads millimetres when the text says mm', () => {
    // 2032 mm / 25.4 mm per inch = 80 in exactly (NIST SP 811)
    expect(readLengthIn('2032 mm')).toBeCloseTo(80, 9);
    expect(readLengthIn('2032mm')).toBeCloseTo(80, 9);
  });

  it('refuses what is not a length', () => {
    expect(readLengthIn('')).toBeNull();
    expect(readLengthIn('tall')).toBeNull();
    expect(readLengthIn('6 ft tall')).toBeNull();
    expect(readLengthIn('80 cm')).toBeNull();
  });
});

describe('lengthProblem', () => {
  it('says what is wrong, or nothing', () => {
    expect(lengthProblem('79 1/2', 240)).toBeNull();
    expect(lengthProblem('0', 240)).toBe('Enter a length above 0');
    expect(lengthProblem('241', 240)).toBe('Enter at most 240 in (6096 mm)');
    expect(lengthProblem('abc', 240, 'the doorway height')).toMatch(/^Enter the doorway height in inches/);
  });
});

describe('lengthInputText', () => {
  it('writes a fraction on a 1/16 tick and a decimal otherwise', () => {
    expect(lengthInputText(79.5)).toBe('79 1/2');
    expect(lengthInputText(80.00984)).toBe('80.0098');
    expect(lengthInputText(null)).toBe('');
  });
});
