import { evaluate } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { CAPACITY_UNITS, convertCapacity, formatCapacity, KILOGRAMS_PER } from './capacity';

describe('convertCapacity — 1 US ton = 907.18474 kg exactly (NIST: 2,000 lb × 0.45359237 kg/lb)', () => {
  it('holds the NIST figure and the tonne', () => {
    // 2000 × 0.45359237 = 907.18474 (the 1959 international pound, exact by definition).
    expect(KILOGRAMS_PER.us_ton).toBe(907.18474);
    expect(KILOGRAMS_PER.tonne).toBe(1000);
  });

  it('250 US tons = 226.796185 t (worked by hand: 250 × 907.18474 / 1000), and the same as mathjs', () => {
    expect(convertCapacity(250, 'us_ton', 'tonne')).toBeCloseTo(226.796185, 9);
    expect(convertCapacity(250, 'us_ton', 'tonne')).toBeCloseTo(evaluate('250 ton to tonne').toNumber('tonne'), 9);
  });

  it('1000 t = 1102.3113109… US tons (1,000,000 / 907.18474), as mathjs says', () => {
    expect(convertCapacity(1000, 'tonne', 'us_ton')).toBeCloseTo(1102.311310924, 9);
    expect(convertCapacity(1000, 'tonne', 'us_ton')).toBeCloseTo(evaluate('1000 tonne to ton').toNumber('ton'), 9);
  });

  it('leaves a value alone in its own unit and comes back to it after a round trip', () => {
    for (const unit of CAPACITY_UNITS) expect(convertCapacity(400, unit, unit)).toBe(400);
    expect(convertCapacity(convertCapacity(400, 'us_ton', 'tonne'), 'tonne', 'us_ton')).toBeCloseTo(400, 9);
  });
});

describe('formatCapacity — one way of printing everywhere', () => {
  it('names the US ton (it has no symbol) and uses the SI symbol t for the tonne', () => {
    expect(formatCapacity(250, 'us_ton')).toBe('250 US tons');
    expect(formatCapacity(1, 'us_ton')).toBe('1 US ton');
    expect(formatCapacity(227, 'tonne')).toBe('227 t');
  });

  it('groups thousands and keeps at most one decimal', () => {
    expect(formatCapacity(1200, 'us_ton')).toBe('1,200 US tons');
    expect(formatCapacity(226.796185, 'tonne')).toBe('226.8 t');
  });
});
