import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Injector } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { provideTubwrightIcons } from '@tubwright/kit';
import type { Clutch, HatchResponse, PairingOutcomes } from '../core/collection-types';
import { type HatchDialogResult, showHatchDialog } from './hatch-dialog';
import { expectedGenes, tracedTraits } from './hatch-rows';

const CLUTCH: Clutch = {
  id: 4, pairingId: 9, laidOn: '2026-10-01', fertileEggs: 3, slugs: 1, incubationTempF: 89, humidityPct: 95, expectedHatchFrom: '2026-11-25', expectedHatchTo: '2026-11-30',
  incubationWarning: null, hatchedOn: null, hatchlingCount: null, notes: '', createdAt: '2026-10-01T09:00:00.000Z',
};
const looks = (amber: 'normal' | 'visual', dusk: 'normal' | 'single') => ({ amber, dusk });
// het amber, single dusk × het amber: amber 1/4 visual (2/3 of the rest het), dusk 1/2 (textbook Mendelian ratios).
const OUTCOMES: PairingOutcomes = {
  outcomes: [
    { name: 'het amber', genotype: { amber: 'het', dusk: 'normal' }, probability: 0.25, fraction: '1/4' },
    { name: 'het amber, dusk', genotype: { amber: 'het', dusk: 'single' }, probability: 0.25, fraction: '1/4' },
    { name: 'normal', genotype: { amber: 'normal', dusk: 'normal' }, probability: 0.125, fraction: '1/8' },
    { name: 'dusk', genotype: { amber: 'normal', dusk: 'single' }, probability: 0.125, fraction: '1/8' },
    { name: 'amber', genotype: { amber: 'visual', dusk: 'normal' }, probability: 0.125, fraction: '1/8' },
    { name: 'amber, dusk', genotype: { amber: 'visual', dusk: 'single' }, probability: 0.125, fraction: '1/8' },
  ],
  appearances: [
    { name: 'normal', looks: looks('normal', 'normal'), probability: 0.375, fraction: '3/8', hetChance: { amber: 0.6667 }, hetFraction: { amber: '2/3' } },
    { name: 'dusk', looks: looks('normal', 'single'), probability: 0.375, fraction: '3/8', hetChance: { amber: 0.6667 }, hetFraction: { amber: '2/3' } },
    { name: 'amber', looks: looks('visual', 'normal'), probability: 0.125, fraction: '1/8', hetChance: {}, hetFraction: {} },
    { name: 'amber, dusk', looks: looks('visual', 'single'), probability: 0.125, fraction: '1/8', hetChance: {}, hetFraction: {} },
  ],
};
const TRAITS = [
  { id: 1, name: 'amber', mode: 'recessive' as const, notes: '', createdAt: '' },
  { id: 2, name: 'dusk', mode: 'incomplete-dominant' as const, notes: '', createdAt: '' },
];

describe('expectedGenes', () => {
  const traits = tracedTraits(OUTCOMES, TRAITS);
  it('gives a normal-looking hatchling of het x het the table\'s 2/3 chance of het', () => {
    expect(traits).toEqual([{ name: 'amber', mode: 'recessive' }, { name: 'dusk', mode: 'incomplete-dominant' }]);
    expect(expectedGenes(OUTCOMES, traits, {})).toEqual(['66.7 % possible het amber']);
    expect(expectedGenes(OUTCOMES, traits, { amber: 'visual', dusk: 'single' })).toEqual(['amber', 'dusk']);
  });

  it('refuses a look the parents cannot give (no super dusk from single x normal)', () => {
    expect(expectedGenes(OUTCOMES, traits, { dusk: 'super' })).toBeNull();
  });
});

describe('HatchDialog', () => {
  let http: HttpTestingController;

  async function open() {
    TestBed.configureTestingModule({
      // Without animations the dialog closes at once.
      providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons(), { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }],
    });
    http = TestBed.inject(HttpTestingController);
    let result: HatchDialogResult | undefined | 'open' = 'open';
    showHatchDialog(TestBed.inject(Injector), CLUTCH, 'PR-001 × PR-002').subscribe((r) => (result = r));
    TestBed.tick();
    http.expectOne('/api/v1/pairings/9/outcomes').flush({ pairingId: 9, outcomes: OUTCOMES });
    http.expectOne((r) => r.url === '/api/v1/traits').flush({ items: TRAITS, total: 2, limit: 200, offset: 0 });
    await TestBed.tick();
    await new Promise((resolve) => setTimeout(resolve));
    TestBed.tick();
    const dialog = () => document.querySelector<HTMLElement>('tw-hatch-dialog')!;
    const byLabel = <T extends HTMLElement>(label: string) => dialog().querySelector<T>(`[aria-label="${label}"]`)!;
    const set = async (el: HTMLInputElement | HTMLSelectElement, value: string) => {
      el.value = value;
      el.dispatchEvent(new Event(el instanceof HTMLSelectElement ? 'change' : 'input'));
      el.dispatchEvent(new Event('blur'));
      TestBed.tick();
    };
    const hatchedOn = () => dialog().querySelector<HTMLInputElement>('input[type=date]')!;
    const submit = () => {
      dialog().querySelector<HTMLButtonElement>('button[type=submit]')!.click();
      TestBed.tick();
    };
    const rowGenes = () => Array.from(dialog().querySelectorAll('table[aria-label="Hatchlings"] tbody tr td.genes')).map((td) => td.textContent!.trim());
    return { dialog, byLabel, set, hatchedOn, submit, rowGenes, result: () => result };
  }

  afterEach(() => {
    http.verify();
    document.querySelectorAll('.cdk-overlay-container').forEach((el) => el.remove());
  });

  it('shows what the parents can produce, one row per fertile egg, and the genes each row will carry', async () => {
    const { dialog, byLabel, set, rowGenes } = await open();
    expect(dialog().querySelector('table[aria-label="Hatchlings by looks"]')!.textContent).toMatch(/normal\s*3\/8 \(37.5 %\)\s*66.7 % het amber/);
    expect(Array.from(dialog().querySelectorAll<HTMLInputElement>('input[aria-label^="Code of hatchling"]')).map((i) => i.value)).toEqual(['C4-01', 'C4-02', 'C4-03']);
    expect(rowGenes()).toEqual(['66.7 % possible het amber', '66.7 % possible het amber', '66.7 % possible het amber']);

    await set(byLabel('amber of hatchling 2'), 'visual');
    await set(byLabel('dusk of hatchling 3'), 'super');
    expect(rowGenes()).toEqual(['66.7 % possible het amber', 'amber', 'these parents cannot give this look']);
    await set(byLabel('dusk of hatchling 3'), 'single');
    await set(dialog().querySelector<HTMLInputElement>('input[formcontrolname="count"]')!, '2');
    expect(rowGenes()).toHaveLength(2);
  });

  it('refuses a future hatch date and one before laying without calling the API', async () => {
    const { dialog, set, hatchedOn, submit } = await open();
    await set(hatchedOn(), new Date(Date.now() + 86_400_000).toISOString().slice(0, 10));
    submit();
    expect(dialog().querySelector('mat-error')?.textContent).toContain('A hatch date cannot be in the future');
    await set(hatchedOn(), '2026-09-30');
    submit();
    expect(dialog().querySelector('mat-error')?.textContent).toContain('The clutch was laid on Oct 1, 2026');
    http.expectNone('/api/v1/clutches/4/hatch');
  });

  it('records the hatch with what each hatchling shows, lists the new animals and opens one', async () => {
    const { dialog, byLabel, set, hatchedOn, submit, result } = await open();
    await set(hatchedOn(), '2026-11-27');
    await set(dialog().querySelector<HTMLInputElement>('input[formcontrolname="count"]')!, '2');
    await set(byLabel('Sex of hatchling 1'), 'female');
    await set(byLabel('amber of hatchling 1'), 'visual');
    await set(byLabel('Code of hatchling 2'), 'PR-210');
    await set(byLabel('Name of hatchling 2'), 'Pip');
    submit();
    const post = http.expectOne('/api/v1/clutches/4/hatch');
    expect(post.request.body).toEqual({
      hatchedOn: '2026-11-27',
      hatchlings: [
        { code: 'C4-01', name: '', sex: 'female', looks: { amber: 'visual' } },
        { code: 'PR-210', name: 'Pip', sex: 'unknown', looks: {} },
      ],
    });
    const response: HatchResponse = {
      clutch: { ...CLUTCH, hatchedOn: '2026-11-27', hatchlingCount: 2 },
      hatchlings: [
        { id: 51, code: 'C4-01', genes: [{ traitId: 1, trait: 'amber', mode: 'recessive', state: 'visual', hetProbability: null }] },
        { id: 52, code: 'PR-210', genes: [{ traitId: 1, trait: 'amber', mode: 'recessive', state: 'possible-het', hetProbability: 0.6667 }] },
      ],
    };
    post.flush(response);
    TestBed.tick();
    expect(dialog().querySelector('h2')!.textContent).toContain('2 hatchlings recorded');
    const links = Array.from(dialog().querySelectorAll<HTMLAnchorElement>('ul[aria-label="New animals"] li'));
    expect(links.map((li) => li.textContent!.replace(/\s+/g, ' ').trim())).toEqual(['C4-01 amber', 'PR-210 66.7 % possible het amber']);
    links[1]!.querySelector('a')!.click();
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(result()).toEqual({ hatch: response, open: 'animals/52' });
  });

  it('puts a taken code from the API under that hatchling\'s code', async () => {
    const { dialog, submit } = await open();
    submit();
    http
      .expectOne('/api/v1/clutches/4/hatch')
      .flush({ error: { code: 'conflict', message: 'Code C4-02 is in use.', field: 'hatchlings[1].code' } }, { status: 409, statusText: 'Conflict' });
    TestBed.tick();
    const rows = dialog().querySelectorAll('table[aria-label="Hatchlings"] tbody tr');
    expect(rows[1]!.querySelector('mat-error')?.textContent?.trim()).toBe('Code C4-02 is in use.');
    expect(rows[0]!.querySelector('mat-error')).toBeNull();
  });
});
