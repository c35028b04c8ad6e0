import { brakeMonitorSettingLimit } from './brake-monitor';

// OSHA 29 CFR 1910.217(h)(5)(iii), read from an unofficial copy only (REFERENCES): the setting may
// allow at most the larger of 10 % of the longest stopping time or 10 ms.
describe('brakeMonitorSettingLimit', () => {
  it('180 ms → 198 ms (10 % is larger than 10 ms)', () => {
    expect(brakeMonitorSettingLimit(0.18).maximumSetting).toBeCloseTo(0.198, 12);
  });

  it('80 ms → 90 ms (10 ms is larger than 10 %)', () => {
    expect(brakeMonitorSettingLimit(0.08).maximumSetting).toBeCloseTo(0.09, 12);
  });

  it('names the standard and refuses a zero stopping time', () => {
    expect(brakeMonitorSettingLimit(0.1).standard).toContain('1910.217(h)(5)(iii)');
    expect(() => brakeMonitorSettingLimit(0)).toThrow(RangeError);
  });
});

describe('brakeMonitorSettingLimit — more cases (OSHA 1910.217(h)(5)(iii), unofficial copy)', () => {
  it('100 ms: 10 % and 10 ms are equal, both give 110 ms; the allowance is reported (computed)', () => {
    const limit = brakeMonitorSettingLimit(0.1);
    expect(limit.allowance).toBeCloseTo(0.01, 12);
    expect(limit.maximumSetting).toBeCloseTo(0.11, 12);
  });

  it('250 ms → allowance 25 ms, setting 275 ms (computed)', () => {
    const limit = brakeMonitorSettingLimit(0.25);
    expect(limit.allowance).toBeCloseTo(0.025, 12);
    expect(limit.maximumSetting).toBeCloseTo(0.275, 12);
  });

  it('refuses negative, NaN and infinite stopping times, saying the time must be above 0 s', () => {
    for (const t of [-0.1, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(() => brakeMonitorSettingLimit(t)).toThrow(/must be above 0 s/);
    }
  });
});
