import type { FirmwareRule, VersionRange } from '../schemas/firmware-rule';
import { FIRMWARE_UNREADABLE } from '../schemas/firmware-version';
import { parseDottedVersion, versionInRange } from './version-compare';

export type FirmwareOutcome = 'compatible' | 'incompatible' | 'unknown';

export interface FirmwareEvaluation {
  outcome: FirmwareOutcome;
  matchedRules: FirmwareRule[];
  reason: string;
}

function describe(range: VersionRange): string {
  if (range.from && range.before) return `${range.from} up to (not incl.) ${range.before}`;
  if (range.from) return `${range.from} or later`;
  if (range.before) return `before ${range.before}`;
  return 'any version';
}

/**
 * Evaluates the pairing of press-control and monitor-module firmware against the rules. When
 * rules disagree, incompatible wins: a wrong "compatible" would send the press back to work.
 */
export function evaluateFirmware(
  pressControl: string,
  monitorModule: string,
  rules: readonly FirmwareRule[],
): FirmwareEvaluation {
  for (const [name, version] of [['press control', pressControl], ['monitor module', monitorModule]] as const) {
    // No rule can be checked against a version nobody could read; the pairing stays unknown.
    if (version === FIRMWARE_UNREADABLE) {
      return { outcome: 'unknown', matchedRules: [], reason: `The ${name} version could not be read, so no compatibility rule can be checked; ask the service manager before going on.` };
    }
    if (!parseDottedVersion(version)) {
      return { outcome: 'unknown', matchedRules: [], reason: `The ${name} version "${version}" is not a dotted version such as 4.2.` };
    }
  }
  const matchedRules = rules.filter(
    (r) => versionInRange(pressControl, r.pressControl) && versionInRange(monitorModule, r.monitorModule),
  );
  const pairing = `press control ${pressControl} with monitor module ${monitorModule}`;
  if (matchedRules.length === 0) {
    return { outcome: 'unknown', matchedRules, reason: `No rule covers ${pairing}; ask the service manager before going on.` };
  }
  const blocking = matchedRules.filter((r) => !r.compatible);
  if (blocking.length > 0) {
    const rule = blocking[0]!;
    return {
      outcome: 'incompatible',
      matchedRules,
      reason: `${pairing} is incompatible (rule ${rule.key}: press control ${describe(rule.pressControl)}, monitor module ${describe(rule.monitorModule)}). ${rule.note}`,
    };
  }
  return { outcome: 'compatible', matchedRules, reason: `${pairing} is compatible (rule ${matchedRules[0]!.key}).` };
}
