import { describe, expect, it } from 'vitest';
import type { InheritanceMode, ParentGene } from '../../../../../shared/api/genetics.js';
import { formatFraction } from './fraction.js';
import { crossTrait, gameteChance, looksOf } from './trait-cross.js';

/** state -> fraction text, so a table reads like a Punnett square worked by hand. */
const table = (mode: InheritanceMode, sire?: ParentGene, dam?: ParentGene) =>
  Object.fromEntries(crossTrait(mode, sire, dam).map((s) => [s.state, formatFraction(s.probability)]));

describe('one trait', () => {
  it('a gamete carries the gene with chance copies / 2', () => {
    expect(formatFraction(gameteChance(undefined))).toBe('0/1');
    expect(formatFraction(gameteChance('het'))).toBe('1/2');
    expect(formatFraction(gameteChance('super'))).toBe('1/1');
    expect(formatFraction(gameteChance({ state: 'possible-het', hetProbability: 0.5 }))).toBe('1/4');
  });

  // Punnett squares worked by hand: rows are the sire's two copies, columns the dam's.
  it('recessive', () => {
    expect(table('recessive', 'visual', 'visual')).toEqual({ visual: '1/1' });
    expect(table('recessive', 'visual', 'normal')).toEqual({ het: '1/1' });
    expect(table('recessive', 'het', 'normal')).toEqual({ normal: '1/2', het: '1/2' });
    expect(table('recessive', 'het', 'het')).toEqual({ normal: '1/4', het: '1/2', visual: '1/4' });
    expect(table('recessive', undefined, undefined)).toEqual({ normal: '1/1' });
  });

  it('incomplete dominant', () => {
    expect(table('incomplete-dominant', 'super', 'normal')).toEqual({ single: '1/1' });
    expect(table('incomplete-dominant', 'super', 'single')).toEqual({ single: '1/2', super: '1/2' });
    expect(table('incomplete-dominant', 'single', 'single')).toEqual({ normal: '1/4', single: '1/2', super: '1/4' });
  });

  it('dominant uses the same states, and both forms look visual', () => {
    expect(table('dominant', 'single', 'normal')).toEqual({ normal: '1/2', single: '1/2' });
    expect(looksOf('dominant', 1)).toBe('visual');
    expect(looksOf('dominant', 2)).toBe('visual');
    expect(looksOf('incomplete-dominant', 2)).toBe('super');
    expect(looksOf('recessive', 1)).toBe('normal');
  });

  it('a possible het is the mixture of het and normal', () => {
    // 50 % het x het: 1/2 of (1/4 visual, 1/2 het, 1/4 normal) + 1/2 of (1/2 het, 1/2 normal)
    expect(table('recessive', { state: 'possible-het', hetProbability: 0.5 }, 'het')).toEqual({ normal: '3/8', het: '1/2', visual: '1/8' });
    // 0.6667 is read exactly as 6667/10000, so the sire passes the gene with chance 6667/20000;
    // the visual dam always does, so that is the chance of a visual and the rest are het
    expect(table('recessive', { state: 'possible-het', hetProbability: 0.6667 }, 'visual')).toEqual({ het: '13333/20000', visual: '6667/20000' });
    expect(table('recessive', { state: 'possible-het', hetProbability: 0 }, 'het')).toEqual(table('recessive', 'normal', 'het'));
    expect(table('recessive', { state: 'possible-het', hetProbability: 1 }, 'het')).toEqual(table('recessive', 'het', 'het'));
  });
});
