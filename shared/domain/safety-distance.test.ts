import { evaluate } from 'mathjs';
import {
  ansiB11_19Distance,
  depthPenetrationFactor,
  HAND_SPEED,
  inchesToMillimetres,
  iso13855Distance,
  oshaPresenceSensingDistance,
  oshaTwoHandTripDistance,
} from './safety-distance';

describe('oshaPresenceSensingDistance — OSHA 29 CFR 1910.217(c)(3)(iii)(e)', () => {
  it('Ts = 0.5 s gives 31.5 in (Washington WAC 296-806-45516 example)', () => {
    const result = oshaPresenceSensingDistance(0.5);
    expect(result.distance).toBeCloseTo(31.5, 10);
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
});

describe('hand speed', () => {
  it('63 in/s is 1600.2 mm/s, close to the 1600 mm/s of ISO 13855 (mathjs conversion)', () => {
    expect(inchesToMillimetres(HAND_SPEED)).toBeCloseTo(evaluate('63 inch to mm').toNumber('mm'), 9);
    expect(inchesToMillimetres(HAND_SPEED)).toBeCloseTo(1600.2, 6);
  });
});
