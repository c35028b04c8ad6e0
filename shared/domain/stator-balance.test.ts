import { statorBalance } from './stator-balance';

// Balance limits here are the tests' own numbers, not check values from a source.
describe('statorBalance', () => {
  it('passes two matching stators', () => {
    expect(statorBalance(70, 70.7, 5)).toMatchObject({ balanced: true });
  });

  it('measures the mismatch against the mean of the two', () => {
    expect(statorBalance(66, 74, 5).imbalancePercent).toBeCloseTo((8 / 70) * 100, 10);
  });

  it('flags a mismatch over the limit even when each winding is within ±10 % of 70 Ω', () => {
    const result = statorBalance(66, 74, 5);
    expect(result.balanced).toBe(false);
    expect(result.reason).toContain('over the 5 % balance limit');
  });

  it('is symmetric in the two stators', () => {
    expect(statorBalance(60, 75, 5).imbalancePercent).toBe(statorBalance(75, 60, 5).imbalancePercent);
  });
});

describe('statorBalance — the limit, the mean and the reason', () => {
  it('exactly on the limit is balanced: 99 Ω and 101 Ω differ by 2 / 100 = 2 % (computed)', () => {
    const result = statorBalance(99, 101, 2);
    expect(result.imbalancePercent).toBeCloseTo(2, 12);
    expect(result).toMatchObject({ balanced: true, limitPercent: 2 });
    expect(result.reason).toMatch(/S1–S3 99 Ω and S2–S4 101 Ω differ by 2\.0 %, within the 2 % balance limit/);
  });

  it('over the limit says which limit and that a winding may be damaged, whichever stator is higher', () => {
    const result = statorBalance(74, 66, 5);
    expect(result.balanced).toBe(false);
    expect(result.imbalancePercent).toBeCloseTo((8 / 70) * 100, 10);
    expect(result.reason).toMatch(/differ by 11\.4 %, over the 5 % balance limit: a winding may be damaged/);
  });

  it('refuses resistances whose mean is not positive', () => {
    expect(() => statorBalance(0, 0, 5)).toThrow(/two positive resistances/);
    expect(() => statorBalance(-1, 1, 5)).toThrow(RangeError);
    expect(() => statorBalance(Number.NaN, 70, 5)).toThrow(RangeError);
  });
});
