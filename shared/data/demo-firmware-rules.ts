import type { FirmwareRule } from '../schemas/firmware-rule';

const INVENTED = 'Invented demo rule — not from any manufacturer.';

/**
 * INVENTED DEMO DATA. Made-up version numbers for the two units; 2.10 appears on purpose so the
 * field-by-field comparison (2.10 after 2.9) is exercised.
 */
export const DEMO_FIRMWARE_RULES: readonly FirmwareRule[] = [
  {
    key: 'demo-ctl3-mod1',
    pressControl: { from: '3.0', before: '4.0' },
    monitorModule: { from: '1.0', before: '2.0' },
    compatible: true,
    note: INVENTED,
    invented: true,
  },
  {
    key: 'demo-ctl4-mod2',
    pressControl: { from: '4.0' },
    monitorModule: { from: '2.0' },
    compatible: true,
    note: INVENTED,
    invented: true,
  },
  {
    key: 'demo-ctl4-mod1',
    pressControl: { from: '4.0' },
    monitorModule: { before: '2.0' },
    compatible: false,
    note: `${INVENTED} Update the monitor module to 2.0 or later.`,
    invented: true,
  },
  {
    key: 'demo-ctl3-mod2',
    pressControl: { before: '4.0' },
    monitorModule: { from: '2.0' },
    compatible: false,
    note: `${INVENTED} Update the press control to 4.0 or later, or fit a 1.x monitor module.`,
    invented: true,
  },
  {
    key: 'demo-ctl4-early-mod2-late',
    pressControl: { from: '4.0', before: '4.3' },
    monitorModule: { from: '2.10' },
    compatible: false,
    note: `${INVENTED} Monitor module 2.10 and later needs press control 4.3 or later.`,
    invented: true,
  },
];
