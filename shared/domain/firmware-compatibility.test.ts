import { DEMO_FIRMWARE_RULES } from '../data/demo-firmware-rules';
import { evaluateFirmware } from './firmware-compatibility';

// The rules are invented demo data; these tests check the evaluation logic, not real pairings.
describe('evaluateFirmware', () => {
  it('finds a compatible pairing', () => {
    expect(evaluateFirmware('3.4', '1.7', DEMO_FIRMWARE_RULES)).toMatchObject({ outcome: 'compatible' });
  });

  it('finds an incompatible pairing and says why', () => {
    const result = evaluateFirmware('4.1', '1.9', DEMO_FIRMWARE_RULES);
    expect(result.outcome).toBe('incompatible');
    expect(result.reason).toContain('demo-ctl4-mod1');
  });

  it('lets an incompatible rule win over a compatible one that also matches', () => {
    // 4.2 with 2.10 matches both demo-ctl4-mod2 (compatible) and demo-ctl4-early-mod2-late (not).
    const result = evaluateFirmware('4.2', '2.10', DEMO_FIRMWARE_RULES);
    expect(result.matchedRules.map((r) => r.key).sort()).toEqual(['demo-ctl4-early-mod2-late', 'demo-ctl4-mod2']);
    expect(result.outcome).toBe('incompatible');
  });

  it('compares field by field: module 2.9 is before 2.10, so control 4.2 with 2.9 is compatible', () => {
    expect(evaluateFirmware('4.2', '2.9', DEMO_FIRMWARE_RULES).outcome).toBe('compatible');
    expect(evaluateFirmware('4.3', '2.10', DEMO_FIRMWARE_RULES).outcome).toBe('compatible');
  });

  it('answers unknown, matching no rule, when a version could not be read (3.4 with 1.7 alone is compatible)', () => {
    for (const [control, monitor] of [['unreadable', '1.7'], ['3.4', 'unreadable'], ['unreadable', 'unreadable']]) {
      const result = evaluateFirmware(control!, monitor!, DEMO_FIRMWARE_RULES);
      expect(result).toMatchObject({ outcome: 'unknown', matchedRules: [] });
      expect(result.reason).toMatch(/could not be read/);
    }
  });

  it('answers unknown when no rule covers the pairing', () => {
    expect(evaluateFirmware('2.0', '1.0', DEMO_FIRMWARE_RULES).outcome).toBe('unknown');
  });

  it('answers unknown, with the reason, for a version that is not dotted numbers', () => {
    const result = evaluateFirmware('4.2-beta', '2.0', DEMO_FIRMWARE_RULES);
    expect(result.outcome).toBe('unknown');
    expect(result.reason).toContain('"4.2-beta"');
  });
});
