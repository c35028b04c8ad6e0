import { DEMO_BAND_SETS } from '../data/demo-band-sets';
import { inferGeneration } from './infer-generation';
import { TRADE_CANDIDATES } from './testing/trade-fact-band-sets';

// Check values: common practice, no published source — older generation rotor about 89 Ω and
// stators about 70 Ω; newer generation rotor about 36 Ω and stators about 90 Ω.
describe('inferGeneration', () => {
  it('picks the older generation from readings near 89 / 70 / 70 Ω with high confidence', () => {
    const result = inferGeneration({ rotor: 88.4, stator_1: 70.6, stator_2: 69.5 }, TRADE_CANDIDATES);
    expect(result.best?.generation).toBe('older');
    expect(result.best!.confidence).toBeGreaterThan(0.99);
    expect(result.best!.fitsAllReadings).toBe(true);
  });

  it('picks the newer generation from readings near 36 / 90 / 90 Ω with high confidence', () => {
    const result = inferGeneration({ rotor: 36.3, stator_1: 91.2, stator_2: 89.1 }, TRADE_CANDIDATES);
    expect(result.best?.generation).toBe('newer');
    expect(result.best!.confidence).toBeGreaterThan(0.99);
  });

  it('can infer from the rotor alone, which differs most between the generations', () => {
    expect(inferGeneration({ rotor: 37 }, TRADE_CANDIDATES).best?.generation).toBe('newer');
  });

  it('is less sure from stators alone, whose nominals are closer (70 vs 90 Ω)', () => {
    const fromStators = inferGeneration({ stator_1: 78, stator_2: 78 }, TRADE_CANDIDATES);
    const fromAll = inferGeneration({ rotor: 89, stator_1: 70, stator_2: 70 }, TRADE_CANDIDATES);
    expect(fromStators.ranked[0]!.confidence).toBeLessThan(fromAll.ranked[0]!.confidence);
  });

  it('declines to suggest a generation when no band set contains the readings (faulty sensor or cable)', () => {
    const result = inferGeneration({ rotor: 250, stator_1: 70, stator_2: 70 }, TRADE_CANDIDATES);
    expect(result.best).toBeNull();
    expect(result.ranked[0]!.generation).toBe('older');
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
    expect(corrected.best?.generation).toBe('older');
    expect(corrected.ranked[0]!.distance).toBeLessThan(0.01);
  });

  it('works on the seeded (invented) demo band sets the same way', () => {
    const candidates = DEMO_BAND_SETS.map((b) => ({ generation: b.generation, values: b.values }));
    const first = DEMO_BAND_SETS[0]!.values.windings;
    const result = inferGeneration({ rotor: first.rotor.nominal, stator_1: first.stator_1.nominal }, candidates);
    expect(result.best?.generation).toBe(DEMO_BAND_SETS[0]!.generation);
  });
});

describe('inferGeneration — the numbers behind the suggestion', () => {
  // z = deviation / near-edge tolerance (20 % in the test bands); distance = √(Σz² / n);
  // confidence = exp(−Σz²/2) normalised over the candidates. Worked by hand below.
  it('rotor 89 Ω, older: z = 0; newer (36 Ω): z = (89/36 − 1)/0.2 = 7.361; distances 0 and 7.361', () => {
    const result = inferGeneration({ rotor: 89 }, TRADE_CANDIDATES);
    const older = result.ranked.find((r) => r.generation === 'older')!;
    const newer = result.ranked.find((r) => r.generation === 'newer')!;
    expect(older.distance).toBeCloseTo(0, 12);
    expect(newer.distance).toBeCloseTo((89 / 36 - 1) / 0.2, 9);
    expect(newer.fitsAllReadings).toBe(false);
    expect(result.ranked.map((r) => r.label)).toEqual(['Older generation (trade check values)', 'Newer generation (trade check values)']);
  });

  it('stators 78 Ω: older z = (78/70 − 1)/0.2 = 0.5714, newer z = (78/90 − 1)/0.2 = −0.6667 each; confidence = 1 / (1 + e^(−(Σz²new − Σz²old)/2))', () => {
    const zOld = (78 / 70 - 1) / 0.2;
    const zNew = (78 / 90 - 1) / 0.2;
    const result = inferGeneration({ stator_1: 78, stator_2: 78 }, TRADE_CANDIDATES);
    const expected = 1 / (1 + Math.exp(-(2 * zNew * zNew - 2 * zOld * zOld) / 2));
    expect(result.ranked[0]!.generation).toBe('older');
    expect(result.ranked[0]!.confidence).toBeCloseTo(expected, 12);
    expect(result.ranked[0]!.distance).toBeCloseTo(Math.sqrt((2 * zOld * zOld) / 2), 12);
    expect(result.ranked[1]!.distance).toBeCloseTo(Math.abs(zNew), 12);
    expect(result.reason).toBe(`The readings match Older generation (trade check values) (confidence ${(expected * 100).toFixed(0)} %); confirm against the sensor before relying on it.`);
  });

  it('a reading exactly at the near-edge limit still fits: rotor 106.8 Ω is +20 % of 89 Ω', () => {
    expect(inferGeneration({ rotor: 89 * 1.2 }, TRADE_CANDIDATES).best?.generation).toBe('older');
  });

  it('ignores zero, negative and NaN readings, using the rest', () => {
    const result = inferGeneration({ rotor: 0, stator_1: Number.NaN, stator_2: 70 }, TRADE_CANDIDATES);
    expect(result.ranked[0]!.distance).toBeCloseTo(0, 12);
    expect(inferGeneration({ rotor: -89 }, TRADE_CANDIDATES).ranked).toEqual([]);
  });

  it('no candidates: no suggestion, and the reason says why', () => {
    expect(inferGeneration({ rotor: 89 }, [])).toEqual({ best: null, ranked: [], reason: expect.stringContaining('No usable resistance readings') });
  });

  it('when no candidate fits, the reason names the nearest', () => {
    expect(inferGeneration({ rotor: 250 }, TRADE_CANDIDATES).reason).toContain('the nearest is Older generation (trade check values)');
  });

  it('two identical candidates share the confidence equally', () => {
    const twin = [
      { generation: 'b', values: { ...TRADE_CANDIDATES[0]!.values, label: 'B' } },
      { generation: 'a', values: { ...TRADE_CANDIDATES[0]!.values, label: 'A' } },
    ];
    const result = inferGeneration({ rotor: 89 }, twin);
    expect(result.ranked.map((r) => r.confidence)).toEqual([0.5, 0.5]);
  });
});

describe('inferGeneration — the near-edge limit', () => {
  // Stator 84 Ω is (84 − 70) / 70 = 20 % above the older nominal: exactly its near-edge limit (computed).
  it('a reading exactly at a candidate\'s near-edge limit still fits it; just beyond does not', () => {
    const older = (value: number) => inferGeneration({ stator_1: value }, TRADE_CANDIDATES).ranked.find((r) => r.generation === 'older')!;
    expect(older(84).fitsAllReadings).toBe(true);
    expect(older(84.1).fitsAllReadings).toBe(false);
  });
});
