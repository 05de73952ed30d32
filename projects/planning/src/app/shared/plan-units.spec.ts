import { convertLengthText, convertMassText, lengthText, readLength, readNumber, showLength, showMass } from './plan-units';

describe('showLength', () => {
  it('shows inches as fractions to 1/16', () => {
    // Opening of a 6 1/2 in tub with the 1/8 in lid gap (common practice).
    expect(showLength(6.625, 'in')).toBe('6 5/8 in');
    // 3 x 16 1/4 + 1/2 play + 2 x 1/2 supports + 2 x 1/2 sides (common practice).
    expect(showLength(51.25, 'in')).toBe('51 1/4 in');
    expect(showLength(0.0625, 'in')).toBe('1/16 in');
    // 0.03 in is under half a sixteenth (0.03125): rounds to 0.
    expect(showLength(0.03, 'in')).toBe('0 in');
  });

  it('shows millimetres to a tenth, and a dash for nothing', () => {
    expect(showLength(168.275, 'mm')).toBe('168.3 mm');
    expect(showLength(null, 'in')).toBe('—');
    expect(showLength(Number.NaN, 'mm')).toBe('—');
  });
});

describe('showMass', () => {
  it('rounds to one decimal with the unit', () => {
    expect(showMass(100.445, 'lb')).toBe('100.4 lb');
    expect(showMass(45.561, 'kg')).toBe('45.6 kg');
  });
});

describe('readLength', () => {
  it('reads inches as a tape reads them', () => {
    expect(readLength('16 1/4', 'in')).toBe(16.25);
    expect(readLength('16.25', 'in')).toBe(16.25);
    expect(readLength(' 6 1/2 in ', 'in')).toBe(6.5);
    expect(readLength('3/4', 'in')).toBe(0.75);
  });

  it('reads millimetres as decimals only', () => {
    expect(readLength('412.75', 'mm')).toBe(412.75);
    expect(readLength('412.75 mm', 'mm')).toBe(412.75);
    expect(readLength('16 1/4', 'mm')).toBeNull();
  });

  it('gives null for what is not a length', () => {
    expect(readLength('', 'in')).toBeNull();
    expect(readLength('sixteen', 'in')).toBeNull();
    expect(readLength('1/0', 'in')).toBeNull();
  });
});

describe('readNumber', () => {
  it('reads plain numbers and ignores a unit sign', () => {
    expect(readNumber('4.5')).toBe(4.5);
    expect(readNumber('200 lb')).toBe(200);
    expect(readNumber('')).toBeNull();
    expect(readNumber('a lot')).toBeNull();
  });
});

describe('lengthText', () => {
  it('writes a fraction when the value sits on a sixteenth, a decimal otherwise', () => {
    expect(lengthText(16.25, 'in')).toBe('16 1/4');
    expect(lengthText(0.125, 'in')).toBe('1/8');
    expect(lengthText(16.1417, 'in')).toBe('16.1417');
    expect(lengthText(3.175, 'mm')).toBe('3.175');
  });
});

describe('convertLengthText', () => {
  it('carries a typed length between units (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    expect(convertLengthText('16 1/4', 'in', 'mm')).toBe('412.75');
    expect(convertLengthText('412.75', 'mm', 'in')).toBe('16 1/4');
    // 410 mm is 16.142 in: the nearest sixteenth is 16 1/8 (16.125).
    expect(convertLengthText('410', 'mm', 'in')).toBe('16 1/8');
  });

  it('leaves unreadable text for the user to fix', () => {
    expect(convertLengthText('16 1/', 'in', 'mm')).toBe('16 1/');
    expect(convertLengthText('', 'in', 'mm')).toBe('');
  });
});

describe('convertMassText', () => {
  it('converts pounds and kilograms (1 lb = 0.45359237 kg exactly, NIST SP 811)', () => {
    expect(convertMassText('4.5', 'in', 'mm')).toBe('2.041');
    expect(convertMassText('2.041', 'mm', 'in')).toBe('4.5');
  });
});
