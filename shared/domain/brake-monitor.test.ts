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
