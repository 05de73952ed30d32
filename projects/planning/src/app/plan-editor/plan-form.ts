import { AbstractControl, FormControl, FormGroup, ValidationErrors, ValidatorFn } from '@angular/forms';
import type { RackPlanRequest, RackPlanRequestInput } from '@tubwright/shared/api/rack-plan';
import { fromInches, toInches } from '@tubwright/shared/units';
import { LengthUnit, convertLengthText, convertMassText, lengthText, readLength, readNumber, trimDecimals } from '../shared/plan-units';

/*
 * The plan editor's form. Its groups and control names mirror the rack-plan request, so an API
 * error naming `layout.levels` lands on the control at that path. Lengths are typed text
 * (`16 1/4` or `16.25` in inches, decimals in mm); counts are numbers.
 */

export type SupportPlacement = 'every-column' | 'when-needed';
export type SectionsMode = 'auto' | 'listed';

/** Defaults of the calculator (common practice, see the rack-plan rules), in inches and pounds. */
export const DEFAULTS_IN = {
  lidGap: 0.125,
  sidePlay: 0.5,
  depthPlay: 0.5,
  panelThickness: 0.5,
  dividerThickness: 0.5,
  kerf: 0.125,
  sheetLength: 96,
  sheetWidth: 48,
  casterHeight: 3.5,
  endMargin: 1,
  maxShelfSag: 0.0625,
  escapeGap: 0.25,
  doorwayHeight: 80,
  ceilingHeight: 96,
} as const;
export const DEFAULTS_LB = { loadedMass: 4.5, casterRating: 200 } as const;

const text = (value = '', validators: ValidatorFn[] = []) => new FormControl(value, { nonNullable: true, validators });
const count = (value: number | null, validators: ValidatorFn[]) => new FormControl<number | null>(value, { validators });

export function createPlanForm() {
  return new FormGroup({
    unit: new FormControl<LengthUnit>('in', { nonNullable: true }),
    tubModelId: new FormControl<number | null>(null),
    tub: new FormGroup({
      length: text('', [lengthRule('Tub length')]),
      width: text('', [lengthRule('Tub width')]),
      height: text('', [lengthRule('Tub height')]),
      loadedMass: text(String(DEFAULTS_LB.loadedMass), [massRule('Loaded tub mass', 10_000)]),
    }),
    layout: new FormGroup({
      levels: count(9, [countRule('Levels', 1, 30)]),
      columns: count(3, [countRule('Columns', 1, 12)]),
      dividers: count(0, [countRule('Dividers', 0, 11), fewerThanColumns]),
    }),
    allowances: new FormGroup({
      lidGap: text(lengthText(DEFAULTS_IN.lidGap, 'in'), [gapRule('Lid gap')]),
      sidePlay: text(lengthText(DEFAULTS_IN.sidePlay, 'in'), [gapRule('Side play')]),
      depthPlay: text(lengthText(DEFAULTS_IN.depthPlay, 'in'), [gapRule('Depth play')]),
    }),
    construction: new FormGroup({
      carcassMaterial: text('pvc-rigid'),
      bottomMaterial: text('plywood'),
      panelThickness: text(lengthText(DEFAULTS_IN.panelThickness, 'in'), [lengthRule('Panel thickness')]),
      dividerThickness: text(lengthText(DEFAULTS_IN.dividerThickness, 'in'), [lengthRule('Divider thickness')]),
      bottomThickness: text('', [lengthRule('Bottom thickness', { optional: true })]),
      kerf: text(lengthText(DEFAULTS_IN.kerf, 'in'), [gapRule('Kerf')]),
      sheet: new FormGroup({
        length: text(lengthText(DEFAULTS_IN.sheetLength, 'in'), [lengthRule('Sheet length')]),
        width: text(lengthText(DEFAULTS_IN.sheetWidth, 'in'), [lengthRule('Sheet width')]),
      }),
      backPanel: new FormControl(false, { nonNullable: true }),
      supportBlock: new FormGroup({
        placement: new FormControl<SupportPlacement>('every-column', { nonNullable: true }),
      }),
    }),
    sections: new FormGroup({
      mode: new FormControl<SectionsMode>('auto', { nonNullable: true }),
      maxSidePanelLength: text('', [lengthRule('Longest side panel', { optional: true })]),
      levelsPerSection: text('', [levelsPerSectionRule]),
    }),
    base: new FormGroup({
      casterCount: count(null, [countRule('Casters', 3, 12, { optional: true })]),
      lockingCasters: count(2, [countRule('Locking casters', 0, 12), notMoreThanCasters]),
      casterHeight: text(lengthText(DEFAULTS_IN.casterHeight, 'in'), [lengthRule('Caster height')]),
      casterRating: text(String(DEFAULTS_LB.casterRating), [massRule('Caster rating', 10_000)]),
    }),
    heat: new FormGroup({
      enabled: new FormControl(true, { nonNullable: true }),
      wattsPerFoot: count(10, [numberRule('Watts per foot', 100)]),
      endMargin: text(lengthText(DEFAULTS_IN.endMargin, 'in'), [gapRule('End margin')]),
      supplyVoltage: count(120, [numberRule('Supply voltage', 480)]),
      thermostatRatingW: count(500, [numberRule('Thermostat rating', 10_000)]),
    }),
    limits: new FormGroup({
      maxShelfSag: text(lengthText(DEFAULTS_IN.maxShelfSag, 'in'), [gapRule('Largest shelf sag')]),
      escapeGap: text(lengthText(DEFAULTS_IN.escapeGap, 'in'), [gapRule('Escape gap')]),
      tipRatio: count(2.5, [numberRule('Height to depth ratio', 20)]),
      doorwayHeight: text(lengthText(DEFAULTS_IN.doorwayHeight, 'in'), [lengthRule('Doorway height')]),
      ceilingHeight: text(lengthText(DEFAULTS_IN.ceilingHeight, 'in'), [lengthRule('Ceiling height')]),
    }),
    /** Per-plan price overrides by price-list key; blank uses the shop's price. Filled when the price list loads. */
    prices: new FormGroup<Record<string, FormControl<number | null>>>({}),
  });
}

export type PlanForm = ReturnType<typeof createPlanForm>;
export type PlanFormValue = ReturnType<PlanForm['getRawValue']>;

/** Lengths of the form, as [group, control] paths; masses apart since they convert lb ⇄ kg. */
const LENGTH_PATHS = [
  'tub.length', 'tub.width', 'tub.height',
  'allowances.lidGap', 'allowances.sidePlay', 'allowances.depthPlay',
  'construction.panelThickness', 'construction.dividerThickness', 'construction.bottomThickness', 'construction.kerf',
  'construction.sheet.length', 'construction.sheet.width',
  'sections.maxSidePanelLength',
  'base.casterHeight', 'heat.endMargin',
  'limits.maxShelfSag', 'limits.escapeGap', 'limits.doorwayHeight', 'limits.ceilingHeight',
] as const;
const MASS_PATHS = ['tub.loadedMass', 'base.casterRating'] as const;

// ---------------------------------------------------------------------------------------------
// Validators: each error's value is the sentence shown under the field.

const unitOf = (control: AbstractControl): LengthUnit => (control.root.get('unit')?.value as LengthUnit | undefined) ?? 'in';

function lengthRule(label: string, options: { optional?: boolean } = {}): ValidatorFn {
  return (control) => checkLength(control, label, { ...options, allowZero: false });
}

function gapRule(label: string): ValidatorFn {
  return (control) => checkLength(control, label, { optional: false, allowZero: true });
}

function checkLength(control: AbstractControl, label: string, options: { optional?: boolean; allowZero: boolean }): ValidationErrors | null {
  const raw = String(control.value ?? '');
  if (!raw.trim()) return options.optional ? null : { required: `${label} is required` };
  const unit = unitOf(control);
  const value = readLength(raw, unit);
  if (value === null) return { length: unit === 'in' ? 'Type inches like 16 1/4 or 16.25' : 'Type millimetres like 412.75' };
  if (value < 0) return { range: `${label} must not be negative` };
  if (!options.allowZero && value === 0) return { range: `${label} must be greater than zero` };
  if (value > 100_000) return { range: `${label} is too large` };
  return null;
}

function massRule(label: string, max: number): ValidatorFn {
  return (control) => {
    const raw = String(control.value ?? '');
    if (!raw.trim()) return { required: `${label} is required` };
    const value = readNumber(raw);
    if (value === null) return { number: 'Type a number like 4.5' };
    if (value <= 0) return { range: `${label} must be greater than zero` };
    if (value > max) return { range: `${label} is too large` };
    return null;
  };
}

function countRule(label: string, min: number, max: number, options: { optional?: boolean } = {}): ValidatorFn {
  return (control) => {
    const value = control.value as number | null;
    if (value === null || value === undefined || (value as unknown) === '') {
      return options.optional ? null : { required: `${label}: type a whole number from ${min} to ${max}` };
    }
    if (!Number.isInteger(value)) return { integer: `${label} must be a whole number` };
    if (value < min || value > max) return { range: `${label} must be from ${min} to ${max}` };
    return null;
  };
}

function numberRule(label: string, max: number): ValidatorFn {
  return (control) => {
    const value = control.value as number | null;
    if (value === null || value === undefined || !Number.isFinite(value)) return { required: `${label} is required` };
    if (value <= 0) return { range: `${label} must be greater than zero` };
    if (value > max) return { range: `${label} must be at most ${max}` };
    return null;
  };
}

/** The API refuses as many dividers as columns: dividers stand between columns. */
const fewerThanColumns: ValidatorFn = (control) => {
  const columns = control.parent?.get('columns')?.value as number | null | undefined;
  const dividers = control.value as number | null;
  return columns && dividers !== null && dividers >= columns ? { dividers: 'Dividers must be fewer than columns' } : null;
};

const notMoreThanCasters: ValidatorFn = (control) => {
  const casters = control.parent?.get('casterCount')?.value as number | null | undefined;
  const locking = control.value as number | null;
  return casters && locking !== null && locking > casters ? { locking: 'Locking casters must not exceed casters' } : null;
};

/** `5, 4` from the bottom; must add up to the levels. */
const levelsPerSectionRule: ValidatorFn = (control) => {
  if (control.parent?.get('mode')?.value !== 'listed') return null;
  const raw = String(control.value ?? '').trim();
  if (!raw) return { required: 'List the levels of each section from the bottom, e.g. 5, 4' };
  const sizes = parseLevelsPerSection(raw);
  if (!sizes) return { list: 'Whole numbers from 1 to 30, separated by commas, e.g. 5, 4' };
  const levels = control.root.get('layout.levels')?.value as number | null | undefined;
  const total = sizes.reduce((a, b) => a + b, 0);
  if (levels && total !== levels) return { sum: `The sections add up to ${total} levels, the rack has ${levels}` };
  return null;
};

export function parseLevelsPerSection(raw: string): number[] | null {
  const parts = raw.split(/[\s,;]+/).filter(Boolean);
  if (!parts.length || parts.length > 30 || parts.some((p) => !/^\d+$/.test(p))) return null;
  const sizes = parts.map(Number);
  return sizes.every((n) => n >= 1 && n <= 30) ? sizes : null;
}

/** The sentence of a control's first error, for `<mat-error>`. */
export function errorText(control: AbstractControl | null | undefined): string {
  const errors = control?.errors;
  if (!errors) return '';
  const first = Object.values(errors)[0] as unknown;
  return typeof first === 'string' ? first : 'Check this value';
}

/** Re-runs every validator (after a unit switch, or a count that others depend on). */
export function revalidateAll(control: AbstractControl): void {
  if (control instanceof FormGroup) Object.values(control.controls).forEach((child) => revalidateAll(child));
  control.updateValueAndValidity({ onlySelf: true, emitEvent: false });
}

// ---------------------------------------------------------------------------------------------
// Form ⇄ request

type Spec = RackPlanRequestInput;

/**
 * The rack-plan request the form describes. `base` is the saved spec being edited: members the
 * form does not show (joints, lumber lengths…) are kept from it. Blank optional fields are left
 * out so the calculator picks its automatic value. Call only when the form is valid.
 */
export function toRackPlanRequest(value: PlanFormValue, base?: RackPlanRequest | null): RackPlanRequest {
  const unit = value.unit;
  const len = (t: string) => readLength(t, unit) ?? undefined;
  const num = (t: string) => readNumber(t) ?? undefined;
  const b = structuredClone(base ?? ({} as Partial<RackPlanRequest>)) as Partial<RackPlanRequest>;
  const v = value;

  const sections: RackPlanRequest['sections'] =
    v.sections.mode === 'listed'
      ? { levelsPerSection: parseLevelsPerSection(v.sections.levelsPerSection) ?? [] }
      : omitUndefined({ maxSidePanelLength: len(v.sections.maxSidePanelLength) });

  const prices = omitUndefined(
    Object.fromEntries(Object.entries(v.prices).map(([key, price]) => [key, price === null ? undefined : price])),
  ) as RackPlanRequest['prices'];

  const request: RackPlanRequest = {
    ...(b as RackPlanRequest),
    unit,
    tub: omitUndefined({ length: len(v.tub.length)!, width: len(v.tub.width)!, height: len(v.tub.height)!, loadedMass: num(v.tub.loadedMass) }),
    layout: { levels: v.layout.levels!, columns: v.layout.columns!, dividers: v.layout.dividers ?? 0 },
    allowances: { lidGap: len(v.allowances.lidGap), sidePlay: len(v.allowances.sidePlay), depthPlay: len(v.allowances.depthPlay) },
    construction: omitUndefined({
      ...b.construction,
      panelThickness: len(v.construction.panelThickness),
      dividerThickness: len(v.construction.dividerThickness),
      bottomThickness: len(v.construction.bottomThickness),
      carcassMaterial: v.construction.carcassMaterial as RackPlanRequest['construction']['carcassMaterial'],
      bottomMaterial: v.construction.bottomMaterial as RackPlanRequest['construction']['bottomMaterial'],
      kerf: len(v.construction.kerf),
      sheet: { length: len(v.construction.sheet.length)!, width: len(v.construction.sheet.width)! },
      backPanel: v.construction.backPanel,
      supportBlock: { ...b.construction?.supportBlock, placement: v.construction.supportBlock.placement },
    }) as RackPlanRequest['construction'],
    sections,
    base: omitUndefined({
      ...b.base,
      casterCount: v.base.casterCount ?? undefined,
      lockingCasters: v.base.lockingCasters ?? 0,
      casterHeight: len(v.base.casterHeight),
      casterRating: num(v.base.casterRating),
    }) as RackPlanRequest['base'],
    // Heat fields are disabled (and not validated) while heat is off: send only the switch.
    heat: !v.heat.enabled ? { ...(b.heat ?? ({} as RackPlanRequest['heat'])), enabled: false } : omitUndefined({
      enabled: v.heat.enabled,
      wattsPerFoot: v.heat.wattsPerFoot ?? 10,
      endMargin: len(v.heat.endMargin),
      supplyVoltage: v.heat.supplyVoltage ?? 120,
      thermostatRatingW: v.heat.thermostatRatingW ?? 500,
    }),
    joints: b.joints ?? ({} as RackPlanRequest['joints']),
    limits: omitUndefined({
      ...b.limits,
      maxShelfSag: len(v.limits.maxShelfSag),
      escapeGap: len(v.limits.escapeGap),
      tipRatio: v.limits.tipRatio ?? 2.5,
      doorwayHeight: len(v.limits.doorwayHeight),
      ceilingHeight: len(v.limits.ceilingHeight),
    }) as RackPlanRequest['limits'],
    prices,
    cutting: b.cutting ?? ({ include: true, timeLimitMs: 500 } as RackPlanRequest['cutting']),
  };
  if (b.unit && b.unit !== unit) convertHiddenLengths(request, b.unit, unit);
  return request;
}

/** Form values for a saved spec; a member the spec leaves out shows the calculator's default. */
export function fromRackPlanRequest(spec: RackPlanRequest | Spec, tubModelId: number | null = null): Omit<PlanFormValue, 'prices'> & { prices: Record<string, number | null> } {
  const unit = spec.unit ?? 'in';
  const len = (value: number | undefined, fallbackIn: number | null) =>
    value !== undefined ? lengthText(value, unit) : fallbackIn === null ? '' : lengthText(unit === 'in' ? fallbackIn : fallbackIn * 25.4, unit);
  const mass = (value: number | undefined, fallbackLb: number) =>
    value !== undefined ? trimDecimals(value, 3) : unit === 'in' ? String(fallbackLb) : convertMassText(String(fallbackLb), 'in', 'mm');
  const c = spec.construction ?? {};
  const s = spec.sections ?? {};
  const base = spec.base ?? {};
  const heat = spec.heat ?? {};
  const limits = spec.limits ?? {};
  const allowances = spec.allowances ?? {};
  return {
    unit,
    tubModelId,
    tub: {
      length: lengthText(spec.tub.length, unit),
      width: lengthText(spec.tub.width, unit),
      height: lengthText(spec.tub.height, unit),
      loadedMass: mass(spec.tub.loadedMass, DEFAULTS_LB.loadedMass),
    },
    layout: { levels: spec.layout.levels, columns: spec.layout.columns, dividers: spec.layout.dividers ?? 0 },
    allowances: {
      lidGap: len(allowances.lidGap, DEFAULTS_IN.lidGap),
      sidePlay: len(allowances.sidePlay, DEFAULTS_IN.sidePlay),
      depthPlay: len(allowances.depthPlay, DEFAULTS_IN.depthPlay),
    },
    construction: {
      carcassMaterial: c.carcassMaterial ?? 'pvc-rigid',
      bottomMaterial: c.bottomMaterial ?? 'plywood',
      panelThickness: len(c.panelThickness, DEFAULTS_IN.panelThickness),
      dividerThickness: len(c.dividerThickness, DEFAULTS_IN.dividerThickness),
      bottomThickness: len(c.bottomThickness, null),
      kerf: len(c.kerf, DEFAULTS_IN.kerf),
      sheet: { length: len(c.sheet?.length, DEFAULTS_IN.sheetLength), width: len(c.sheet?.width, DEFAULTS_IN.sheetWidth) },
      backPanel: c.backPanel ?? false,
      supportBlock: { placement: c.supportBlock?.placement ?? 'every-column' },
    },
    sections: {
      mode: s.levelsPerSection ? 'listed' : 'auto',
      maxSidePanelLength: len(s.maxSidePanelLength, null),
      levelsPerSection: s.levelsPerSection ? s.levelsPerSection.join(', ') : '',
    },
    base: {
      casterCount: base.casterCount ?? null,
      lockingCasters: base.lockingCasters ?? 2,
      casterHeight: len(base.casterHeight, DEFAULTS_IN.casterHeight),
      casterRating: mass(base.casterRating, DEFAULTS_LB.casterRating),
    },
    heat: {
      enabled: heat.enabled ?? true,
      wattsPerFoot: heat.wattsPerFoot ?? 10,
      endMargin: len(heat.endMargin, DEFAULTS_IN.endMargin),
      supplyVoltage: heat.supplyVoltage ?? 120,
      thermostatRatingW: heat.thermostatRatingW ?? 500,
    },
    limits: {
      maxShelfSag: len(limits.maxShelfSag, DEFAULTS_IN.maxShelfSag),
      escapeGap: len(limits.escapeGap, DEFAULTS_IN.escapeGap),
      tipRatio: limits.tipRatio ?? 2.5,
      doorwayHeight: len(limits.doorwayHeight, DEFAULTS_IN.doorwayHeight),
      ceilingHeight: len(limits.ceilingHeight, DEFAULTS_IN.ceilingHeight),
    },
    prices: Object.fromEntries(Object.entries(spec.prices ?? {}).filter(([, p]) => p !== undefined)) as Record<string, number | null>,
  };
}

/** Carries every typed length and mass of the form to the other unit (the unit switch). */
export function convertFormUnit(form: PlanForm, from: LengthUnit, to: LengthUnit): void {
  if (from === to) return;
  for (const path of LENGTH_PATHS) {
    const control = form.get(path) as FormControl<string>;
    control.setValue(convertLengthText(control.value, from, to), { emitEvent: false });
  }
  for (const path of MASS_PATHS) {
    const control = form.get(path) as FormControl<string>;
    control.setValue(convertMassText(control.value, from, to), { emitEvent: false });
  }
}

/** Lengths kept from a saved spec but not shown in the form follow a unit switch too. */
function convertHiddenLengths(request: RackPlanRequest, from: LengthUnit, to: LengthUnit): void {
  const convert = (value: number | undefined) => (value === undefined ? undefined : fromInches(toInches(value, from), to));
  const block = request.construction.supportBlock;
  if (block) {
    if (block.frontDepth !== undefined) block.frontDepth = convert(block.frontDepth);
    if (block.backDepth !== undefined) block.backDepth = convert(block.backDepth);
  }
  if (request.construction.backPanelThickness !== undefined) request.construction.backPanelThickness = convert(request.construction.backPanelThickness);
  if (request.base.lumberStockLengths) request.base.lumberStockLengths = request.base.lumberStockLengths.map((x) => convert(x)!);
  if (request.limits.bindGap !== undefined) request.limits.bindGap = convert(request.limits.bindGap);
}

function omitUndefined<T extends object>(value: T): T {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as T;
}
