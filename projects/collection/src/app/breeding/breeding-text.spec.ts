import { addDays, expectedHatchPreview, seasonOf } from './breeding-text';

describe('breeding dates', () => {
  it('adds days across month and year ends', () => {
    expect(addDays('2026-11-20', 55)).toBe('2027-01-14');
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29'); // leap year
  });

  it('previews a hatch window 55 to 60 days after laying (common practice at 88 to 90 °F)', () => {
    expect(expectedHatchPreview('2026-11-20')).toEqual({ from: '2027-01-14', to: '2027-01-19' });
    expect(expectedHatchPreview('')).toBeNull();
    expect(expectedHatchPreview('2026-13-40')).toBeNull();
  });

  it('names the season that runs over the new year', () => {
    expect(seasonOf(new Date('2026-11-02T00:00:00Z'))).toBe('2026-27');
    expect(seasonOf(new Date('2027-03-02T00:00:00Z'))).toBe('2026-27');
    expect(seasonOf(new Date('2099-09-01T00:00:00Z'))).toBe('2099-00');
  });
});
