import { z } from 'zod';
import { nameText, text } from './text';

/** Dotted numeric version such as 4.2 or 2.10.1 (fields compared as numbers). */
export const dottedVersionSchema = z
  .string()
  .trim()
  .regex(/^\d{1,6}(\.\d{1,6}){0,5}$/, 'type a dotted version such as 4.2 or 2.10.1');

/** Half-open version range: from (inclusive) up to but not including before. */
export const versionRangeSchema = z.object({
  from: dottedVersionSchema.optional(),
  before: dottedVersionSchema.optional(),
});
export type VersionRange = z.infer<typeof versionRangeSchema>;

export const FIRMWARE_UNITS = ['press_control', 'monitor_module'] as const;
export const firmwareUnitSchema = z.enum(FIRMWARE_UNITS);
export type FirmwareUnit = z.infer<typeof firmwareUnitSchema>;

/** A row of firmware_rules: which pairing of the two units' versions works. */
export const firmwareRuleSchema = z.object({
  key: nameText({ min: 1, max: 80, trim: false }),
  pressControl: versionRangeSchema,
  monitorModule: versionRangeSchema,
  compatible: z.boolean(),
  note: text({ max: 500, trim: false }),
  invented: z.boolean(),
});
export type FirmwareRule = z.infer<typeof firmwareRuleSchema>;
