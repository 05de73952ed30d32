import { ApiError } from '@tubwright/kit';
import { FormControl } from '@angular/forms';
import { clearServerErrors, controlForField, showOnField } from './field-errors';
import { createPlanForm, errorText } from './plan-form';

describe('controlForField', () => {
  const form = createPlanForm();
  form.controls.prices.addControl('sheet.pvc-rigid', new FormControl<number | null>(null));

  it('finds the control the API names, with or without the records service prefix', () => {
    expect(controlForField(form, 'layout.levels')).toBe(form.controls.layout.controls.levels);
    expect(controlForField(form, 'spec.tub.length')).toBe(form.controls.tub.controls.length);
    expect(controlForField(form, 'construction.sheet.width')).toBe(form.controls.construction.controls.sheet.controls.width);
  });

  it('maps a list item to its list field and keeps dots inside price keys', () => {
    expect(controlForField(form, 'sections.levelsPerSection[1]')).toBe(form.controls.sections.controls.levelsPerSection);
    expect(controlForField(form, 'prices.sheet.pvc-rigid')).toBe(form.controls.prices.controls['sheet.pvc-rigid']);
  });

  it('gives null for fields the form does not show, and for groups', () => {
    expect(controlForField(form, 'joints.screwsPerCorner')).toBeNull();
    expect(controlForField(form, 'layout')).toBeNull();
    expect(controlForField(form, undefined)).toBeNull();
  });
});

describe('showOnField', () => {
  it('puts the message on the field without repeating its path, until the next check', () => {
    const form = createPlanForm();
    const levels = form.controls.layout.controls.levels;
    const shown = showOnField(form, new ApiError(400, 'invalid_input', 'layout.levels: Too small: expected number to be >=1', 'layout.levels'));
    expect(shown).toBe(true);
    expect(errorText(levels)).toBe('Too small: expected number to be >=1');
    expect(levels.touched).toBe(true);

    clearServerErrors(form);
    expect(levels.errors).toBeNull();
  });

  it('says so when no field matches', () => {
    expect(showOnField(createPlanForm(), new ApiError(422, 'unprocessable', 'no stock', 'cutting.parts'))).toBe(false);
  });
});
