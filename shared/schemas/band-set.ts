import { z } from 'zod';
import { nameText, text } from './text';

const positive = z.number().positive().finite();
const percent = z.number().positive().max(100);

/** Reference values for one winding (ohms at the band's reference temperature). */
export const windingBandSchema = z
  .object({
    nominal: positive,
    inBandPercent: percent,
    nearEdgePercent: percent,
    shortBelow: z.number().nonnegative(),
    openAbove: positive,
  })
  .superRefine((band, ctx) => {
    if (band.nearEdgePercent <= band.inBandPercent) {
      ctx.addIssue({ code: 'custom', message: 'near-edge tolerance must be wider than the in-band tolerance', path: ['nearEdgePercent'] });
    }
    if (band.shortBelow >= band.nominal * (1 - band.nearEdgePercent / 100)) {
      ctx.addIssue({ code: 'custom', message: 'short threshold must lie below the near-edge band', path: ['shortBelow'] });
    }
    if (band.openAbove <= band.nominal * (1 + band.nearEdgePercent / 100)) {
      ctx.addIssue({ code: 'custom', message: 'open threshold must lie above the near-edge band', path: ['openAbove'] });
    }
  });
export type WindingBand = z.infer<typeof windingBandSchema>;

/** An AC-voltage range in volts RMS; the near-edge margin widens it on both sides. */
export const voltageRangeSchema = z
  .object({ min: positive, max: positive, nearEdgePercent: percent })
  .refine((r) => r.max > r.min, { message: 'max must be above min', path: ['max'] });
export type VoltageRange = z.infer<typeof voltageRangeSchema>;

/**
 * A band for the transformation ratio (stator-pair magnitude ÷ excitation). It has no unit, and
 * because both readings come from the same meter, a meter that reads low at the excitation
 * frequency reads both low by about the same factor: the ratio still means something.
 */
export const ratioRangeSchema = z
  .object({ min: positive.max(10), max: positive.max(10), nearEdgePercent: percent })
  .refine((r) => r.max > r.min, { message: 'max must be above min', path: ['max'] });
export type RatioRange = z.infer<typeof ratioRangeSchema>;

const isBlank = (v: unknown) => v === undefined || v === null || v === '' || (typeof v === 'number' && Number.isNaN(v));

/** A form leaves the optional ratio band and frequency blank (NaN): that means "not given". */
export function withoutBlankOptionals<T extends { transformationRatio?: unknown; excitationFrequencyHz?: unknown }>(values: T): T {
  const copy = { ...values };
  const ratio = copy.transformationRatio;
  if (isBlank(ratio) || (typeof ratio === 'object' && ratio !== null && Object.values(ratio).every(isBlank))) delete copy.transformationRatio;
  if (isBlank(copy.excitationFrequencyHz)) delete copy.excitationFrequencyHz;
  return copy;
}

/** The JSON stored in band_sets.values. */
export const bandSetValuesSchema = z.object({
  label: nameText({ min: 1, max: 120, trim: false }),
  referenceTemperatureC: z.number().min(-40).max(150),
  windings: z.object({
    rotor: windingBandSchema,
    stator_1: windingBandSchema,
    stator_2: windingBandSchema,
  }),
  statorBalancePercent: percent,
  excitation: voltageRangeSchema,
  statorOutputMagnitude: voltageRangeSchema,
  // Optional so the versions published before these existed still read; new versions set both.
  transformationRatio: ratioRangeSchema.optional(),
  /** The excitation frequency in hertz: the meter's AC bandwidth must cover it. */
  excitationFrequencyHz: z.number().positive().max(1_000_000).optional(),
  invented: z.boolean(),
  note: text({ max: 500, trim: false }),
});
export type BandSetValues = z.infer<typeof bandSetValuesSchema>;

export const generationKeySchema = z
  .string()
  .regex(/^[a-z0-9][a-z0-9-]{0,62}$/, 'use lower-case letters, digits and hyphens');

/** A row of band_sets: one version of the values for one sensor generation. */
export const bandSetSchema = z.object({
  generation: generationKeySchema,
  version: z.number().int().positive(),
  values: bandSetValuesSchema,
});
export type BandSet = z.infer<typeof bandSetSchema>;
