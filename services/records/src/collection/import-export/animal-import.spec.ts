import { describe, expect, it } from 'vitest';
import { parseCsv } from '../shared/csv.js';
import { ANIMAL_CSV_COLUMNS, ANIMAL_CSV_REQUIRED, checkAnimalRows } from './animal-import.js';

const check = (text: string, taken: string[] = []) => checkAnimalRows(parseCsv(text, ANIMAL_CSV_COLUMNS, ANIMAL_CSV_REQUIRED), new Set(taken), '2026-12-02');

describe('animal CSV rows', () => {
  it('reads text cells into animals with defaults', () => {
    const r = check('code,species,sex,weightG,forSale,hatchDate\nIM-1,Python regius,female,412,yes,2025-06-01\nIM-2,Python regius,,,,\n');
    expect(r.errors).toEqual([]);
    expect(r.animals[0]).toEqual({ row: 2, animal: expect.objectContaining({ code: 'IM-1', sex: 'female', weightG: 412, forSale: true, hatchDate: '2025-06-01', status: 'active' }) });
    expect(r.animals[1]!.animal).toMatchObject({ sex: 'unknown', weightG: null, forSale: false, hatchDate: null });
  });

  it('lists every bad row and field: types, enums, duplicates, taken codes, future dates', () => {
    const r = check(
      'code,species,sex,weightG,forSale,hatchDate\n' +
        'IM-1,Python regius,f,-3,maybe,2025-06-01\n' +
        ',Python regius,,,,\n' +
        'IM-3,Python regius,,heavy,,2099-01-01\n' +
        'im-3,Python regius,,,,\n' +
        'PR-001,Python regius,,,,\n',
      ['pr-001'],
    );
    expect(r.errors.map((e) => `${e.row}:${e.field}`)).toEqual(['2:forSale', '2:sex', '2:weightG', '3:code', '4:weightG', '4:hatchDate', '5:code', '6:code']);
  });
});
