import { DEMO_BAND_SETS } from '../data/demo-band-sets';
import { inferGeneration } from './infer-generation';
import { TRADE_CANDIDATES } from './testing/trade-fact-band-sets';

// Check values: common practice, no published source — older generation rotor about 89 Ω and
// stators about 70 Ω; newer generation rotor about 36 Ω and stators about 90 Ω.
describe('inferGeneration', () => {
  it('picks the older generation from readings near 89 / 70 / 70 Ω with high confidence', () => {
    const result = inferGeneration({ rotor: 88.4, stator_1: 70.6, stator_2: 69.5 }, TRADE_CANDIDATES);
    expect(result.best?.generationKey).toBe('older');
    expect(result.best!.confidence).toBeGreaterThan(0.99);
    expect(result.best!.fitsAllReadings).toBe(true);
  });

  it('picks the newer generation from readings near 36 / 90 / 90 Ω with high confidence', () => {
    const result = inferGeneration({ rotor: 36.3, stator_1: 91.2, stator_2: 89.1 }, TRADE_CANDIDATES);
    expect(result.best?.generationKey).toBe('newer');
    expect(result.best!.confidence).toBeGreaterThan(0.99);
  });

  it('can infer from the rotor alone, which differs most between the generations', () => {
    expect(inferGeneration({ rotor: 37 }, TRADE_CANDIDATES).best?.generationKey).toBe('newer');
  });

  it('is less sure from stators alone, whose nominals are closer (70 vs 90 Ω)', () => {
    const fromStators = inferGeneration({ stator_1: 78, stator_2: 78 }, TRADE_CANDIDATES);
    const fromAll = inferGeneration({ rotor: 89, stator_1: 70, stator_2: 70 }, TRADE_CANDIDATES);
    expect(fromStators.ranked[0]!.confidence).toBeLessThan(fromAll.ranked[0]!.confidence);
  });

  it('declines to suggest a generation when no band set contains the readings (faulty sensor or cable)', () => {
    const result = inferGeneration({ rotor: 250, stator_1: 70, stator_2: 70 }, TRADE_CANDIDATES);
    expect(result.best).toBeNull();
    expect(result.ranked[0]!.generationKey).toBe('older');
    expect(result.reason).toContain('do not infer');
  });

  it('ignores open readings and says so when nothing usable is left', () => {
    const result = inferGeneration({ rotor: Number.POSITIVE_INFINITY }, TRADE_CANDIDATES);
    expect(result.best).toBeNull();
    expect(result.ranked).toEqual([]);
  });

  it('confidences over the candidates add up to 1, even for readings far from every nominal', () => {
    const result = inferGeneration({ rotor: 5000, stator_1: 5000 }, TRADE_CANDIDATES);
    expect(result.ranked.reduce((s, r) => s + r.confidence, 0)).toBeCloseTo(1, 12);
  });

  it('corrects warm readings to the reference temperature first (234.5 copper rule)', () => {
    // 89 Ω and 70 Ω at 20 °C read about 21 % higher at 75 °C: (234.5 + 75)/(234.5 + 20) = 1.216.
    const warm = { rotor: 89 * 1.216, stator_1: 70 * 1.216, stator_2: 70 * 1.216 };
    expect(inferGeneration(warm, TRADE_CANDIDATES).best).toBeNull();
    const corrected = inferGeneration(warm, TRADE_CANDIDATES, 75);
    expect(corrected.best?.generationKey).toBe('older');
    expect(corrected.ranked[0]!.distance).toBeLessThan(0.01);
  });

  it('works on the seeded (invented) demo band sets the same way', () => {
    const candidates = DEMO_BAND_SETS.map((b) => ({ generationKey: b.generationKey, values: b.values }));
    const first = DEMO_BAND_SETS[0]!.values.windings;
    const result = inferGeneration({ rotor: first.rotor.nominal, stator_1: first.stator_1.nominal }, candidates);
    expect(result.best?.generationKey).toBe(DEMO_BAND_SETS[0]!.generationKey);
  });
});
