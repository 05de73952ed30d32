import { FormControl, FormGroup } from '@angular/forms';
import { EMPTY_ANIMAL, fieldMessage, intervalDays, pastDay, saleFitsStatus, toAnimalRequest, toProfileRequest } from './animal-form-rules';

describe('animal form rules', () => {
  it('takes hatch dates up to today, refuses later ones and bad dates', () => {
    const rule = pastDay(() => '2026-12-02');
    expect(rule(new FormControl(''))).toBeNull();
    expect(rule(new FormControl('2026-12-02'))).toBeNull();
    expect(rule(new FormControl('2026-12-03'))).toEqual({ future: 'A hatch date cannot be in the future' });
    expect(rule(new FormControl('12/01/2026'))).toEqual({ date: 'Give a date like 2026-06-14' });
  });

  it('takes a feeding interval of whole days 1 to 90, or blank', () => {
    for (const ok of ['', '1', '14', '90']) expect(intervalDays(new FormControl(ok)), ok).toBeNull();
    for (const bad of ['0', '91', '7.5', 'weekly']) expect(intervalDays(new FormControl(bad)), bad).not.toBeNull();
  });

  it('refuses for sale with sold or deceased only', () => {
    const group = (status: string, forSale: boolean) => new FormGroup({ status: new FormControl(status), forSale: new FormControl(forSale) });
    expect(saleFitsStatus(group('deceased', true))).toEqual({ forSale: 'A deceased animal cannot be offered for sale' });
    expect(saleFitsStatus(group('deceased', false))).toBeNull();
    expect(saleFitsStatus(group('on-hold', true))).toBeNull();
  });

  it('sends parents only when bred here and a source only when acquired', () => {
    const value = { ...EMPTY_ANIMAL, code: ' PR-1 ', sireId: 3, damId: 4, acquiredFrom: 'a show', feedingIntervalDays: ' 7 ' };
    expect(toProfileRequest({ ...value, origin: 'bred' })).toEqual({ origin: 'bred', acquiredFrom: '', sireId: 3, damId: 4, feedingIntervalDays: 7, forSale: false });
    expect(toProfileRequest({ ...value, origin: 'acquired' })).toEqual({ origin: 'acquired', acquiredFrom: 'a show', sireId: null, damId: null, feedingIntervalDays: 7, forSale: false });
    expect(toAnimalRequest(value)).toMatchObject({ code: 'PR-1', hatchDate: null, species: 'Python regius' });
  });

  it('drops the field name the API puts before its message', () => {
    expect(fieldMessage('hatchDate: 2027-01-01 is in the future', 'hatchDate')).toBe('2027-01-01 is in the future');
    expect(fieldMessage('Code PR-1 is in use', 'code')).toBe('Code PR-1 is in use');
  });
});
