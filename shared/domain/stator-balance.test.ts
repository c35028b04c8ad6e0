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
