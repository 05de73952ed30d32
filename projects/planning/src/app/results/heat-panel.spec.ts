import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import { HeatPanel } from './heat-panel';
import { nineByThree } from './result-fixture';

async function render(cautions: string[], enabled = true) {
  TestBed.configureTestingModule({ providers: [provideTubwrightIcons()] });
  const { result } = nineByThree();
  const fixture = TestBed.createComponent(HeatPanel);
  fixture.componentRef.setInput('result', { ...result, heat: { ...result.heat, enabled, cautions } });
  await fixture.whenStable();
  const element = fixture.nativeElement as HTMLElement;
  return { element, cautions: Array.from(element.querySelectorAll('.cautions li')).map((li) => li.textContent?.trim()) };
}

describe('HeatPanel', () => {
  it('always defers to local code and a licensed electrician, even when the API does not say so', async () => {
    const { cautions } = await render(['Follow the thermostat maker’s rating.']);
    expect(cautions).toEqual([
      'Follow the thermostat maker’s rating.',
      'Follow local electrical code and defer to it over anything shown here.',
      'Have the wiring done or checked by a licensed electrician.',
    ]);
  });

  it('does not repeat what the API already says', async () => {
    const { cautions } = await render(['Follow local electrical code; have wiring done by a licensed electrician where required.']);
    expect(cautions).toEqual(['Follow local electrical code; have wiring done by a licensed electrician where required.']);
  });

  it('shows strips, watts, amps and the circuit share', async () => {
    const { element } = await render(['x']);
    const text = element.textContent ?? '';
    // 9 strips of 48 1/4 in (interior 50 1/4 in less 1 in at each end) at 10 W/ft.
    expect(text).toContain('9 × 48 1/4 in');
    expect(text).toContain('362 W, 3.02 A at 120 V');
    const rows = Array.from(element.querySelectorAll('.circuits tbody tr')).map((tr) => Array.from(tr.children).map((c) => c.textContent?.trim()));
    // 80 % of 15 A x 120 V = 1440 W, of 20 A = 1920 W (NFPA 70, 210.19/210.20).
    expect(rows).toEqual([
      ['15 A, 120 V', '1440 W', '25 %'],
      ['20 A, 120 V', '1920 W', '19 %'],
    ]);
  });

  it('says when no heat is planned, still with the cautions', async () => {
    const { element, cautions } = await render(['x'], false);
    expect(element.textContent).toContain('No heat tape is planned');
    expect(cautions.length).toBe(3);
  });
});
