import { firmwareRuleSchema } from '../schemas/firmware-rule';
import { DEMO_FIRMWARE_RULES } from './demo-firmware-rules';

describe('DEMO_FIRMWARE_RULES', () => {
  it('are valid rules with unique keys, each marked invented', () => {
    for (const rule of DEMO_FIRMWARE_RULES) {
      expect(firmwareRuleSchema.safeParse(rule).success).toBe(true);
      expect(rule.invented).toBe(true);
      expect(rule.note).toContain('Invented demo rule');
    }
    expect(new Set(DEMO_FIRMWARE_RULES.map((r) => r.key)).size).toBe(DEMO_FIRMWARE_RULES.length);
  });
});
