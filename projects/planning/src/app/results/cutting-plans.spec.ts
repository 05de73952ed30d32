import { TestBed } from '@angular/core/testing';
import { CuttingPlans, boundVerdict, materialCuttings } from './cutting-plans';
import { nineByThree } from './result-fixture';

describe('boundVerdict', () => {
  it('says optimal at the lower bound, else how far above it', () => {
    expect(boundVerdict(6, 6)).toBe('optimal');
    expect(boundVerdict(7, 6)).toBe('1 above the best possible');
    expect(boundVerdict(9, 6)).toBe('3 above the best possible');
  });
});

describe('materialCuttings', () => {
  it('numbers the stock pieces across layouts and names the parts on each', () => {
    const { result } = nineByThree();
    const [sheets, boards] = materialCuttings(result.cutting!, result.parts);
    expect(sheets).toMatchObject({ title: 'Rigid PVC 1/2 in', used: '7 sheets', verdict: '1 above the best possible', yieldPercent: '51 %' });
    expect(sheets!.diagrams.map((d) => d.caption)).toEqual(['Sheet 1, 96 in × 48 in', 'Sheets 2–7 (cut alike), 96 in × 48 in']);
    expect(sheets!.diagrams[0]!.alt).toBe('Sheet 1: parts 1 side panel, 2 interior shelf');
    expect(sheets!.diagrams[0]!.src.startsWith('data:image/svg+xml;charset=utf-8,%3Csvg')).toBe(true);
    expect(boards).toMatchObject({ title: '2x4 lumber', used: '1 board', verdict: 'optimal' });
    expect(boards!.diagrams[0]!.caption).toBe('Board 1, 168 in');
  });
});

describe('CuttingPlans', () => {
  it('shows one diagram per layout with its verdict', async () => {
    const fixture = TestBed.createComponent(CuttingPlans);
    fixture.componentRef.setInput('result', nineByThree().result);
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    expect(element.querySelectorAll('img.cutting-diagram')).toHaveLength(3);
    expect(element.querySelector('.verdict')?.textContent?.trim()).toBe('1 above the best possible');
  });
});
