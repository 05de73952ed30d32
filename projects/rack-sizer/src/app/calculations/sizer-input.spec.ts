import { EMPTY_TEXT, rackSpec, readCount, readSize, readSizer, sizerFieldOf } from './sizer-input';

describe('readSize', () => {
  it('reads inches with fractions as a builder writes them', () => {
    expect(readSize('16 1/4', 'in')).toEqual({ value: 16.25 });
    expect(readSize('6.5', 'in')).toEqual({ value: 6.5 });
    expect(readSize(' 23" ', 'in')).toEqual({ value: 23 });
  });

  it('reads millimetres, with a decimal comma too', () => {
    expect(readSize('412.75', 'mm')).toEqual({ value: 412.75 });
    expect(readSize('165,1 mm', 'mm')).toEqual({ value: 165.1 });
  });

  it('says what is wrong', () => {
    expect(readSize('', 'in')).toEqual({ error: 'Enter the size' });
    expect(readSize('six', 'in')).toEqual({ error: 'Use inches, e.g. 16 1/4 or 16.25' });
    expect(readSize('16 1/4', 'mm')).toEqual({ error: 'Use millimetres, e.g. 413' });
    expect(readSize('0', 'in')).toEqual({ error: 'Must be more than zero' });
    expect(readSize('121', 'in')).toEqual({ error: 'Must be at most 120 in' });
  });
});

describe('readCount', () => {
  it('takes whole numbers within the API limits', () => {
    expect(readCount('9', 'levels')).toEqual({ value: 9 });
    expect(readCount('31', 'levels')).toEqual({ error: 'From 1 to 30' });
    expect(readCount('13', 'columns')).toEqual({ error: 'From 1 to 12' });
    expect(readCount('2.5', 'columns')).toEqual({ error: 'Use a whole number' });
  });
});

describe('readSizer and rackSpec', () => {
  it('gives values only when every field reads, and the spec the calculator takes', () => {
    const text = { length: '23', width: '16 1/4', height: '6 1/2', levels: '9', columns: '3' };
    const { values, errors } = readSizer(text, 'in');
    expect(errors).toEqual({});
    expect(rackSpec(values!, 'in')).toEqual({
      unit: 'in',
      tub: { length: 23, width: 16.25, height: 6.5 },
      layout: { levels: 9, columns: 3 },
      cutting: { include: true, timeLimitMs: 300 },
    });
    expect(readSizer({ ...text, columns: '' }, 'in')).toEqual({ values: null, errors: { columns: 'Enter a number' } });
    expect(Object.keys(readSizer(EMPTY_TEXT, 'in').errors)).toHaveLength(5);
  });

  it('maps calculator fields back to the widget fields', () => {
    expect(sizerFieldOf('tub.height')).toBe('height');
    expect(sizerFieldOf('spec.layout.levels')).toBe('levels');
    expect(sizerFieldOf('construction.sheet')).toBeNull();
    expect(sizerFieldOf(undefined)).toBeNull();
  });
});
