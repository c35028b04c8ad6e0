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

describe('evaluateFirmware — the reasons name the pairing and the rule ranges', () => {
  it('incompatible: names the pairing, the rule, both ranges and the rule\'s note', () => {
    const result = evaluateFirmware('4.1', '1.9', DEMO_FIRMWARE_RULES);
    expect(result.reason).toContain('press control 4.1 with monitor module 1.9 is incompatible');
    expect(result.reason).toContain('(rule demo-ctl4-mod1: press control 4.0 or later, monitor module before 2.0)');
    expect(result.reason).toContain('Update the monitor module to 2.0 or later.');
  });

  it('describes a range with both ends, and one with no ends at all', () => {
    const both = evaluateFirmware('4.2', '2.10', DEMO_FIRMWARE_RULES);
    expect(both.reason).toContain('press control 4.0 up to (not incl.) 4.3, monitor module 2.10 or later');
    const open = evaluateFirmware('1.0', '1.0', [{ key: 'x', pressControl: {}, monitorModule: {}, compatible: false, note: 'n', invented: true }]);
    expect(open.reason).toContain('press control any version, monitor module any version');
  });

  it('compatible: names the pairing and the first matching rule', () => {
    expect(evaluateFirmware('3.4', '1.7', DEMO_FIRMWARE_RULES).reason).toBe('press control 3.4 with monitor module 1.7 is compatible (rule demo-ctl3-mod1).');
  });

  it('unknown: names the pairing and says to ask before going on; matched rules are empty', () => {
    const result = evaluateFirmware('2.0', '1.0', DEMO_FIRMWARE_RULES);
    expect(result.matchedRules).toEqual([]);
    expect(result.reason).toBe('No rule covers press control 2.0 with monitor module 1.0; ask the service manager before going on.');
  });

  it('a monitor-module version that is not dotted is named as the monitor module\'s', () => {
    const result = evaluateFirmware('4.2', 'two', DEMO_FIRMWARE_RULES);
    expect(result).toMatchObject({ outcome: 'unknown', matchedRules: [] });
    expect(result.reason).toBe('The monitor module version "two" is not a dotted version such as 4.2.');
  });

  it('a rule matches only when both versions are in its ranges', () => {
    // 3.5 is in demo-ctl3-mod1's press-control range but 2.0 is not in its module range; demo-ctl3-mod2 matches instead.
    expect(evaluateFirmware('3.5', '2.0', DEMO_FIRMWARE_RULES).matchedRules.map((r) => r.key)).toEqual(['demo-ctl3-mod2']);
  });
});
