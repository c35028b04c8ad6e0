import { evaluate } from 'mathjs';
import {
  ansiB11_19Distance,
  depthPenetrationFactor,
  HAND_SPEED,
  inchesToMillimetres,
  iso13855Distance,
  oshaPresenceSensingDistance,
  oshaTwoHandControlDistance,
  oshaTwoHandTripDistance,
} from './safety-distance';

describe('oshaPresenceSensingDistance — OSHA 29 CFR 1910.217(c)(3)(iii)(e)', () => {
  it('Ts = 0.5 s gives 31.5 in (Washington WAC 296-806-45516 example)', () => {
    const result = oshaPresenceSensingDistance(0.5);
    expect(result.distance).toBeCloseTo(31.5, 10);
    expect(result.unit).toBe('in');
    expect(result.standard).toBe('OSHA 29 CFR 1910.217(c)(3)(iii)(e)');
  });

  it('agrees with the OSHA machine-guarding eTool chart: 0.317 s → 20 in, 0.055 s → 3.5 in (±0.001 s chart rounding)', () => {
    expect(Math.abs(oshaPresenceSensingDistance(0.317).distance - 20)).toBeLessThanOrEqual(63 * 0.001);
    expect(Math.abs(oshaPresenceSensingDistance(0.055).distance - 3.5)).toBeLessThanOrEqual(63 * 0.001);
  });

  it('refuses a negative stopping time', () => {
    expect(() => oshaPresenceSensingDistance(-0.1)).toThrow(RangeError);
  });
});

describe('oshaTwoHandTripDistance — OSHA 29 CFR 1910.217(c)(3)(viii)(c)', () => {
  it('60 strokes/min with one engaging point: Tm = 1.5 s, Ds = 94.5 in (REFERENCES, computed)', () => {
    const result = oshaTwoHandTripDistance(60, 1);
    expect(result.maximumTime).toBeCloseTo(1.5, 12);
    expect(result.distance).toBeCloseTo(94.5, 10);
    expect(result.standard).toContain('1910.217(c)(3)(viii)(c)');
  });
});

// OSHA 29 CFR 1910.217(c)(3)(vii)(c), two-hand control: Ds = 63 in/s × Ts, Ts measured at about 90°
// of crank rotation. The formula is quoted from memory of the regulation's text; it has the same form
// as (c)(3)(iii)(e) in REFERENCES. The figures below are worked by hand.
describe('oshaTwoHandControlDistance — OSHA 29 CFR 1910.217(c)(3)(vii)(c)', () => {
  it('Ts = 0.18 s: Ds = 63 × 0.18 = 11.34 in (computed)', () => {
    const result = oshaTwoHandControlDistance(0.18);
    expect(result.distance).toBeCloseTo(11.34, 10);
    expect(result.unit).toBe('in');
    expect(result.standard).toBe('OSHA 29 CFR 1910.217(c)(3)(vii)(c)');
    expect(result.formula).toBe('Ds = 63 in/s × 0.18 s');
  });

  it('Ts = 0.5 s: Ds = 31.5 in, the same hand speed as the presence-sensing rule (computed)', () => {
    expect(oshaTwoHandControlDistance(0.5).distance).toBeCloseTo(31.5, 10);
  });

  it('accepts 0 s and refuses negative, NaN and infinite stopping times, naming the time', () => {
    expect(oshaTwoHandControlDistance(0).distance).toBe(0);
    for (const t of [-0.001, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(() => oshaTwoHandControlDistance(t)).toThrow(/Stopping time must be a time of 0 s or more/);
    }
  });
});

describe('ansiB11_19Distance — ANSI B11.19 style formula', () => {
  it('Ts + Tc = 0.180 s, Tr = 0.020 s, Tbm = 0.018 s, S = 30 mm → 16.811 in (REFERENCES, computed)', () => {
    const result = ansiB11_19Distance({
      stopTime: 0.18,
      deviceResponseTime: 0.02,
      brakeMonitorSetting: 0.198,
      objectSensitivity: 30 / 25.4,
    });
    expect(result.brakeMonitorAllowance).toBeCloseTo(0.018, 12);
    expect(result.distance).toBeCloseTo(16.811, 3);
    expect(result.standard).toContain('B11.19');
  });

  it('Ts + Tc = 0.17 s, Tr = 0.13 s, S = 14 mm → 19.836 in (REFERENCES, computed)', () => {
    const result = ansiB11_19Distance({ stopTime: 0.17, deviceResponseTime: 0.13, objectSensitivity: 14 / 25.4 });
    expect(result.distance).toBeCloseTo(19.836, 3);
  });

  it('never lets Dpf go below 0 for very fine sensitivity, and refuses S of 2.5 in or more', () => {
    expect(depthPenetrationFactor(0.2)).toBe(0);
    expect(() => depthPenetrationFactor(2.5)).toThrow(RangeError);
  });

  it('refuses a brake-monitor setting below the stop time', () => {
    expect(() => ansiB11_19Distance({ stopTime: 0.2, deviceResponseTime: 0.02, brakeMonitorSetting: 0.15, objectSensitivity: 1 })).toThrow(/brake-monitor/);
  });
});

describe('iso13855Distance — ISO 13855, detection capability ≤ 40 mm', () => {
  it.each([
    [0.32, 14, 512], // 2000 × 0.32 = 640 > 500 → 1600 × 0.32 = 512
    [0.165, 14, 330],
    [0.3, 14, 500], // 600 > 500 → 480, but not below 500
    [0.1, 30, 328],
  ])('T = %f s, d = %f mm → %f mm (REFERENCES, computed)', (t, d, expected) => {
    const result = iso13855Distance(t, d);
    expect(result.distance).toBeCloseTo(expected, 9);
    expect(result.standard).toBe('ISO 13855');
  });

  it('never gives less than 100 mm', () => {
    expect(iso13855Distance(0.01, 14).distance).toBe(100);
  });

  // From memory of the standard's text, not checked against a copy: the intrusion term 8 × (d − 14)
  // is not allowed below 0, so a finer device (d < 14 mm) earns no reduction. T = 0.2 s, d = 10 mm:
  // 2000 × 0.2 = 400 mm, plus 0 (not 8 × (10 − 14) = −32) → 400 mm.
  it('clamps the intrusion term at 0 for d < 14 mm (from memory)', () => {
    const result = iso13855Distance(0.2, 10);
    expect(result.distance).toBeCloseTo(400, 9);
    expect(result.formula).toContain('+ 0.0 mm');
  });
});

describe('hand speed', () => {
  it('63 in/s is 1600.2 mm/s, close to the 1600 mm/s of ISO 13855 (mathjs conversion)', () => {
    expect(inchesToMillimetres(HAND_SPEED)).toBeCloseTo(evaluate('63 inch to mm').toNumber('mm'), 9);
    expect(inchesToMillimetres(HAND_SPEED)).toBeCloseTo(1600.2, 6);
  });
});

describe('oshaTwoHandTripDistance — the shape of Tm = (1/2 + 1/N) × revolution time', () => {
  // Worked by hand from OSHA 1910.217(c)(3)(viii)(c). At 60 SPM and N = 1 a wrong formula can agree by
  // chance (1/N = N, 60/SPM = SPM/60), so these use other values.
  it('30 strokes/min, N = 2: one revolution 2 s, Tm = (0.5 + 0.5) × 2 = 2 s, Ds = 63 × 2 = 126 in (computed)', () => {
    const result = oshaTwoHandTripDistance(30, 2);
    expect(result.maximumTime).toBeCloseTo(2, 12);
    expect(result.distance).toBeCloseTo(126, 10);
    expect(result.unit).toBe('in');
  });

  it('120 strokes/min, N = 4: one revolution 0.5 s, Tm = 0.75 × 0.5 = 0.375 s, Ds = 23.625 in (computed)', () => {
    const result = oshaTwoHandTripDistance(120, 4);
    expect(result.maximumTime).toBeCloseTo(0.375, 12);
    expect(result.distance).toBeCloseTo(23.625, 10);
    // The formula shown in the report carries N and the revolution time.
    expect(result.formula).toContain('63 in/s');
    expect(result.formula).toContain('1/2 + 1/4');
    expect(result.formula).toContain('0.500 s');
  });

  it('refuses a stroke rate that is not above 0, and N that is not a whole number of 1 or more', () => {
    for (const spm of [0, -30, Number.NaN]) expect(() => oshaTwoHandTripDistance(spm, 1)).toThrow(/Strokes per minute/);
    for (const n of [0, -1, 1.5, Number.NaN]) expect(() => oshaTwoHandTripDistance(60, n)).toThrow(/Engaging points/);
    expect(() => oshaTwoHandTripDistance(0.5, 1)).not.toThrow();
  });
});

describe('stopping-time guard of the distance formulas', () => {
  it('accepts 0 s (a zero time is a time) and refuses negative, NaN and infinite times, naming the time', () => {
    expect(oshaPresenceSensingDistance(0).distance).toBe(0);
    expect(oshaPresenceSensingDistance(0).formula).toContain('63 in/s × 0 s');
    for (const t of [-0.001, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(() => oshaPresenceSensingDistance(t)).toThrow(/Stopping time must be a time of 0 s or more/);
      expect(() => iso13855Distance(t, 14)).toThrow(/Overall stopping time/);
    }
    expect(() => ansiB11_19Distance({ stopTime: -0.1, deviceResponseTime: 0.02, objectSensitivity: 1 })).toThrow(/Stop time/);
    expect(() => ansiB11_19Distance({ stopTime: 0.1, deviceResponseTime: -0.02, objectSensitivity: 1 })).toThrow(/Device response time/);
  });
});

describe('depthPenetrationFactor — Dpf = 3.4 × (S − 0.276) in (ANSI B11.19 formula as in REFERENCES)', () => {
  it('S = 1 in gives 3.4 × 0.724 = 2.4616 in (computed)', () => {
    expect(depthPenetrationFactor(1)).toBeCloseTo(2.4616, 10);
  });

  it('S = 0.276 in gives exactly 0, and just below 2.5 in is still covered: 3.4 × 2.214 = 7.5276 in (computed)', () => {
    expect(depthPenetrationFactor(0.276)).toBeCloseTo(0, 12);
    expect(depthPenetrationFactor(2.49)).toBeCloseTo(7.5276, 10);
  });

  it('refuses S of 0 or less, and NaN, pointing at the standard for larger values', () => {
    for (const s of [0, -0.5, Number.NaN]) expect(() => depthPenetrationFactor(s)).toThrow(RangeError);
    expect(() => depthPenetrationFactor(3)).toThrow(/below 2\.5 in/);
  });
});

describe('ansiB11_19Distance — brake-monitor allowance and the figures shown', () => {
  it('a brake-monitor setting equal to the stop time is allowed: Tbm = 0, Ds = 63 × 0.22 + 2.4616 = 16.3216 in (computed)', () => {
    const result = ansiB11_19Distance({ stopTime: 0.2, deviceResponseTime: 0.02, brakeMonitorSetting: 0.2, objectSensitivity: 1 });
    expect(result.brakeMonitorAllowance).toBe(0);
    expect(result.distance).toBeCloseTo(16.3216, 10);
  });

  it('without a brake-monitor setting there is no allowance, and the formula shows the total time and Dpf', () => {
    const result = ansiB11_19Distance({ stopTime: 0.17, deviceResponseTime: 0.13, objectSensitivity: 1 });
    expect(result.brakeMonitorAllowance).toBe(0);
    expect(result.depthPenetration).toBeCloseTo(2.4616, 10);
    expect(result.unit).toBe('in');
    expect(result.formula).toContain('63 in/s × 0.300 s');
    expect(result.formula).toContain('Dpf 2.462 in');
  });

  it('the refusal of a setting below the stop time says the monitor would stop the press every stroke', () => {
    expect(() => ansiB11_19Distance({ stopTime: 0.2, deviceResponseTime: 0.02, brakeMonitorSetting: 0.19, objectSensitivity: 1 })).toThrow(
      /below the measured stop time/,
    );
  });
});

describe('iso13855Distance — range, intrusion term and the 500 mm recomputation', () => {
  it('T = 0.4 s, d = 30 mm: 800 + 128 = 928 > 500 → 1600 × 0.4 + 128 = 768 mm (computed; the intrusion is added)', () => {
    const result = iso13855Distance(0.4, 30);
    expect(result.distance).toBeCloseTo(768, 9);
    expect(result.formula).toContain('max(500 mm, 1600 mm/s × 0.4 s + 128.0 mm)');
  });

  it('d = 40 mm is the largest covered: T = 0.1 s → 200 + 8 × 26 = 408 mm (computed)', () => {
    expect(iso13855Distance(0.1, 40).distance).toBeCloseTo(408, 9);
  });

  it('refuses d above 40 mm, 0 mm, negative and NaN (this formula covers d ≤ 40 mm only)', () => {
    for (const d of [40.5, 41, 60, 0, -14, Number.NaN]) expect(() => iso13855Distance(0.1, d)).toThrow(/up to 40 mm/);
  });

  it('d below 14 mm adds no negative intrusion: T = 0.1 s, d = 10 mm → 200 mm, not 168 mm (from memory of the standard: C is not below 0)', () => {
    const result = iso13855Distance(0.1, 10);
    expect(result.distance).toBeCloseTo(200, 9);
    expect(result.formula).toContain('2000 mm/s × 0.1 s + 0.0 mm');
  });

  it('exactly 500 mm is not recomputed: T = 0.25 s, d = 14 mm → 2000 × 0.25 = 500 mm with the 2000 mm/s formula (computed)', () => {
    const result = iso13855Distance(0.25, 14);
    expect(result.distance).toBe(500);
    expect(result.formula).toBe('S = 2000 mm/s × 0.25 s + 0.0 mm');
  });

  it('the 100 mm floor applies to the result shown: T = 0.01 s, d = 14 mm → 20 mm raised to 100 mm', () => {
    const result = iso13855Distance(0.01, 14);
    expect(result.distance).toBe(100);
    expect(result.unit).toBe('mm');
  });
});

describe('units of the OSHA results', () => {
  it('the presence-sensing distance is in inches, like its 63 in/s constant', () => {
    expect(oshaPresenceSensingDistance(0.5).unit).toBe('in');
  });
});
