import { FormControl } from '@angular/forms';
import type { RackPlanRequest } from '../shared/plan-types';
import { convertFormUnit, createPlanForm, errorText, fromRackPlanRequest, revalidateAll, toRackPlanRequest } from './plan-form';

function typedTub() {
  const form = createPlanForm();
  form.controls.tub.setValue({ length: '23', width: '16 1/4', height: '6 1/2', loadedMass: '4.5' });
  return form;
}

describe('plan form validation', () => {
  it('needs the tub sizes and reads them as a tape reads', () => {
    const form = createPlanForm();
    expect(form.valid).toBe(false);
    expect(errorText(form.controls.tub.controls.length)).toBe('Tub length is required');
    form.controls.tub.controls.length.setValue('23 1/');
    expect(errorText(form.controls.tub.controls.length)).toBe('Type inches like 16 1/4 or 16.25');
    expect(typedTub().valid).toBe(true);
  });

  it('refuses what the API refuses, saying which field and why', () => {
    const form = typedTub();
    const { levels, columns, dividers } = form.controls.layout.controls;
    levels.setValue(0);
    expect(errorText(levels)).toBe('Levels must be from 1 to 30');
    levels.setValue(2.5);
    expect(errorText(levels)).toBe('Levels must be a whole number');
    columns.setValue(13);
    expect(errorText(columns)).toBe('Columns must be from 1 to 12');
    columns.setValue(3);
    dividers.setValue(3);
    expect(errorText(dividers)).toBe('Dividers must be fewer than columns');
    form.controls.tub.controls.height.setValue('0');
    expect(errorText(form.controls.tub.controls.height)).toBe('Tub height must be greater than zero');
  });

  it('checks that listed sections add up to the levels', () => {
    const form = typedTub();
    const listed = form.controls.sections.controls.levelsPerSection;
    listed.setValue('5, 3');
    // Only checked when the user chose to list the sections.
    expect(listed.valid).toBe(true);
    form.controls.sections.controls.mode.setValue('listed');
    listed.updateValueAndValidity();
    expect(errorText(listed)).toBe('The sections add up to 8 levels, the rack has 9');
    listed.setValue('5 4');
    expect(listed.valid).toBe(true);
    listed.setValue('5, zero');
    expect(errorText(listed)).toBe('Whole numbers from 1 to 30, separated by commas, e.g. 5, 4');
  });

  it('validates lengths in the unit chosen', () => {
    const form = typedTub();
    form.controls.unit.setValue('mm');
    revalidateAll(form);
    // "16 1/4" is not a millimetre value.
    expect(errorText(form.controls.tub.controls.width)).toBe('Type millimetres like 412.75');
  });
});

describe('toRackPlanRequest', () => {
  it('turns typed fractions into the request, leaving automatic fields out', () => {
    const request = toRackPlanRequest(typedTub().getRawValue());
    expect(request.unit).toBe('in');
    expect(request.tub).toEqual({ length: 23, width: 16.25, height: 6.5, loadedMass: 4.5 });
    expect(request.layout).toEqual({ levels: 9, columns: 3, dividers: 0 });
    expect(request.allowances).toEqual({ lidGap: 0.125, sidePlay: 0.5, depthPlay: 0.5 });
    expect(request.construction.bottomThickness).toBeUndefined();
    expect(request.base.casterCount).toBeUndefined();
    expect(request.sections).toEqual({});
    expect(request.prices).toEqual({});
  });

  it('sends listed sections and only the prices typed for this plan', () => {
    const form = typedTub();
    form.controls.sections.setValue({ mode: 'listed', maxSidePanelLength: '', levelsPerSection: '5, 4' });
    form.controls.prices.addControl('thermostat', new FormControl<number | null>(95));
    form.controls.prices.addControl('caster', new FormControl<number | null>(null));
    const request = toRackPlanRequest(form.getRawValue());
    expect(request.sections).toEqual({ levelsPerSection: [5, 4] });
    expect(request.prices).toEqual({ thermostat: 95 });
  });

  it('keeps what the form does not show from the saved spec', () => {
    const saved = {
      ...toRackPlanRequest(typedTub().getRawValue()),
      joints: { screwsPerCorner: 4 },
      base: { lockingCasters: 2, lumberStockLengths: [96, 120] },
    } as unknown as RackPlanRequest;
    const form = createPlanForm();
    form.patchValue(fromRackPlanRequest(saved));
    const request = toRackPlanRequest(form.getRawValue(), saved);
    expect(request.joints).toEqual({ screwsPerCorner: 4 });
    expect(request.base.lumberStockLengths).toEqual([96, 120]);
    expect(request.tub).toEqual(saved.tub);
  });

  it('sends heat as switched off without the fields it hides', () => {
    const form = typedTub();
    form.controls.heat.controls.enabled.setValue(false);
    form.controls.heat.controls.wattsPerFoot.setValue(-1);
    expect(toRackPlanRequest(form.getRawValue()).heat).toEqual({ enabled: false });
  });
});

describe('convertFormUnit', () => {
  it('carries every length and mass to millimetres and back', () => {
    const form = typedTub();
    form.controls.unit.setValue('mm');
    convertFormUnit(form, 'in', 'mm');
    // 16 1/4 in = 412.75 mm; 1/8 in = 3.175 mm; 4.5 lb = 2.041 kg (NIST SP 811 factors).
    expect(form.controls.tub.controls.width.value).toBe('412.75');
    expect(form.controls.allowances.controls.lidGap.value).toBe('3.175');
    expect(form.controls.tub.controls.loadedMass.value).toBe('2.041');
    convertFormUnit(form, 'mm', 'in');
    expect(form.controls.tub.controls.width.value).toBe('16 1/4');
    expect(form.controls.allowances.controls.lidGap.value).toBe('1/8');
  });
});
