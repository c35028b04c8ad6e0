import { z } from 'zod';
import { nameText } from './text';

// The trade's words for readings: one definition shared by client, server and engine.
export const QUANTITIES = ['resistance', 'ac_voltage'] as const;
export const CIRCUITS = ['rotor', 'stator_1', 'stator_2'] as const;
export const POSITIONS = ['control_end', 'sensor_end'] as const;
export const VERDICTS = ['in_band', 'near_edge', 'out_of_band', 'open', 'short'] as const;
export const CAUSE_CATEGORIES = [
  'configuration',
  'wiring',
  'firmware',
  'sensor',
  'cable',
  'board',
  'none_found',
] as const;

export const quantitySchema = z.enum(QUANTITIES);
export const circuitSchema = z.enum(CIRCUITS);
export const positionSchema = z.enum(POSITIONS);
export const verdictSchema = z.enum(VERDICTS);
export const causeCategorySchema = z.enum(CAUSE_CATEGORIES);

export type Quantity = z.infer<typeof quantitySchema>;
export type Circuit = z.infer<typeof circuitSchema>;
export type Position = z.infer<typeof positionSchema>;
export type Verdict = z.infer<typeof verdictSchema>;
export type CauseCategory = z.infer<typeof causeCategorySchema>;

/** Lead pairs as marked on the sensor and its connector. */
export const CIRCUIT_LEADS: Record<Circuit, string> = {
  rotor: 'R1–R2',
  stator_1: 'S1–S3',
  stator_2: 'S2–S4',
};

/** Cable between control and sensor, as the technician describes it. */
export const cableSchema = z.object({
  awg: z.number().int().min(0).max(40),
  length: z.number().positive().max(10_000),
  lengthUnit: z.enum(['ft', 'm']),
  // Whether `length` is the cable run (one way) or the whole loop out and back.
  lengthIs: z.enum(['one_way', 'loop']),
  temperatureC: z.number().min(-40).max(150).optional(),
});
export type Cable = z.infer<typeof cableSchema>;

/** One reading as typed at the press, before the engine judges it. */
export const readingInputSchema = z.object({
  quantity: quantitySchema,
  circuit: circuitSchema,
  position: positionSchema,
  entered: nameText({ max: 40, trim: false }),
  windingTemperatureC: z.number().min(-40).max(150).optional(),
  cable: cableSchema.optional(),
});
export type ReadingInput = z.infer<typeof readingInputSchema>;
