import { z } from 'zod';
import { causeCategorySchema, circuitSchema, positionSchema, quantitySchema } from './reading';
import { nameText, text as freeText } from './text';

export const STEP_KINDS = ['safety_gate', 'check', 'choice', 'measure', 'firmware', 'inspect', 'finding'] as const;
export type StepKind = (typeof STEP_KINDS)[number];

/** How each step kind is named on every screen (one list: workspace, admin and diagram use it). */
export const STEP_KIND_LABELS: Record<StepKind, string> = {
  safety_gate: 'Safety gate',
  check: 'Yes/no check',
  choice: 'Choice',
  measure: 'Measurement',
  firmware: 'Firmware check',
  inspect: 'Inspection',
  finding: 'Finding',
};

/**
 * ANSI Z535 signal words, most severe first. DANGER, WARNING and CAUTION are for hazards to
 * people; NOTICE is for practices that can damage property but not hurt anyone (ANSI Z535.6).
 */
export const SIGNAL_WORDS = ['DANGER', 'WARNING', 'CAUTION', 'NOTICE'] as const;
export type SignalWord = (typeof SIGNAL_WORDS)[number];

/**
 * What a step's work exposes someone (or something) to. A step tagged with a hazard must carry a
 * safety message that covers it, at least as severe as HAZARD_SIGNAL_WORDS allows; the validator
 * also infers some tags from the step's kind, position and words, so they cannot be forgotten.
 */
export const HAZARDS = [
  'energized_work',
  'working_at_height',
  'slide_motion',
  'stored_energy',
  'unit_swap',
  'relock',
  'insulation_test',
  'board_handling',
] as const;
export type Hazard = (typeof HAZARDS)[number];

/** The signal words a message covering each hazard may use. */
export const HAZARD_SIGNAL_WORDS: Record<Hazard, readonly SignalWord[]> = {
  energized_work: ['DANGER', 'WARNING'],
  working_at_height: ['DANGER', 'WARNING'],
  slide_motion: ['DANGER', 'WARNING'],
  stored_energy: ['DANGER', 'WARNING'],
  unit_swap: ['DANGER', 'WARNING'],
  relock: ['DANGER', 'WARNING'],
  insulation_test: ['DANGER', 'WARNING'],
  // Damage to a board, not injury: ANSI Z535 keeps the injury words for injury.
  board_handling: ['NOTICE'],
};

/**
 * What a safety gate establishes. lockout leaves the circuits de-energized and locked;
 * live_work means the precautions for energized work are in place.
 */
export const SAFETY_GATES = ['press_at_rest', 'die_area', 'lockout', 'live_work'] as const;

/** Outcomes each kind must offer; measure and firmware outcomes are computed by the engine. */
export const REQUIRED_OUTCOMES = {
  safety_gate: ['confirmed'],
  check: ['yes', 'no'],
  firmware: ['compatible', 'incompatible', 'unknown'],
  measure_resistance: ['pass', 'imbalance', 'low', 'high'],
  // Which reading fails decides the suspect: the drive (excitation) or the sensor and cable (output).
  measure_ac_voltage: ['pass', 'excitation_out_of_range', 'output_low', 'output_high'],
} as const;

const slug = z.string().regex(/^[a-z0-9][a-z0-9_-]{0,62}$/, 'use lower-case letters, digits, - and _');
const text = (max: number) => freeText({ min: 1, max });
const title = (max: number) => nameText({ min: 1, max });

export const safetyMessageSchema = z.object({
  signalWord: z.enum(SIGNAL_WORDS),
  text: text(1200),
  /** The hazards this message speaks to; a step's hazards must each be covered by one of its messages. */
  covers: z.array(z.enum(HAZARDS)).max(HAZARDS.length).optional(),
});
export type SafetyMessage = z.infer<typeof safetyMessageSchema>;

/** What choosing an outcome says about the likely cause: positive points to it, negative rules it out. */
export const causeEvidenceSchema = z.object({
  cause: causeCategorySchema,
  weight: z.number().int().min(-3).max(3),
  because: text(300),
});
export type CauseEvidence = z.infer<typeof causeEvidenceSchema>;

export const outcomeSchema = z.object({
  value: slug,
  label: title(160),
  next: slug,
  evidence: z.array(causeEvidenceSchema).max(7).optional(),
});
export type Outcome = z.infer<typeof outcomeSchema>;

export const stepInputSchema = z.object({
  key: slug,
  label: title(160),
  type: z.enum(['text', 'sensor_generation', 'version', 'photo', 'yes_no']),
  required: z.boolean(),
});
export type StepInput = z.infer<typeof stepInputSchema>;

/** Which band of the visit's band set a reading is judged against. */
export const bandRefSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('winding'), circuit: circuitSchema }),
  z.object({ kind: z.literal('excitation') }),
  z.object({ kind: z.literal('stator_output') }),
]);
export type BandRef = z.infer<typeof bandRefSchema>;

export const readingSpecSchema = z.object({
  key: slug,
  label: title(160),
  quantity: quantitySchema,
  circuit: circuitSchema,
  position: positionSchema,
  // Optional here so the validator can name the step that lacks it.
  band: bandRefSchema.optional(),
});
export type ReadingSpec = z.infer<typeof readingSpecSchema>;

const stepBase = {
  id: slug,
  title: title(160),
  instructions: text(4000),
  safety: safetyMessageSchema.optional(),
  /** Further safety messages shown after the first, most severe first. */
  cautions: z.array(safetyMessageSchema).max(8).optional(),
  hazards: z.array(z.enum(HAZARDS)).max(HAZARDS.length).optional(),
  inputs: z.array(stepInputSchema).max(20).optional(),
};
const outcomes = z.array(outcomeSchema).min(1).max(20);

export const safetyGateStepSchema = z.object({
  ...stepBase,
  kind: z.literal('safety_gate'),
  gate: z.enum(SAFETY_GATES),
  confirmations: z.array(text(400)).min(1).max(20),
  outcomes,
});
export const checkStepSchema = z.object({ ...stepBase, kind: z.literal('check'), outcomes });
export const choiceStepSchema = z.object({ ...stepBase, kind: z.literal('choice'), outcomes });
export const measureStepSchema = z.object({
  ...stepBase,
  kind: z.literal('measure'),
  meterSetting: title(200),
  readings: z.array(readingSpecSchema).min(1).max(12),
  // When the visit has no sensor generation yet, suggest one from these readings.
  suggestsGeneration: z.boolean().optional(),
  outcomes,
});
export const firmwareStepSchema = z.object({ ...stepBase, kind: z.literal('firmware'), outcomes });
export const inspectStepSchema = z.object({
  ...stepBase,
  kind: z.literal('inspect'),
  photoPrompt: text(400),
  outcomes,
});
export const findingStepSchema = z.object({
  ...stepBase,
  kind: z.literal('finding'),
  cause: causeCategorySchema,
  conclusion: text(1000),
  recommendedAction: text(3000),
  escalate: z.boolean(),
});

export const stepSchema = z.discriminatedUnion('kind', [
  safetyGateStepSchema,
  checkStepSchema,
  choiceStepSchema,
  measureStepSchema,
  firmwareStepSchema,
  inspectStepSchema,
  findingStepSchema,
]);
export type Step = z.infer<typeof stepSchema>;
export type SafetyGateStep = z.infer<typeof safetyGateStepSchema>;
export type MeasureStep = z.infer<typeof measureStepSchema>;
export type FindingStep = z.infer<typeof findingStepSchema>;
export type BranchingStep = Exclude<Step, FindingStep>;

/** The JSON stored in procedures.definition. */
export const procedureDefinitionSchema = z.object({
  formatVersion: z.literal(1),
  start: slug,
  steps: z.array(stepSchema).min(1).max(200),
});
export type ProcedureDefinition = z.infer<typeof procedureDefinitionSchema>;

/** A row of procedures: one version of one procedure. */
export const procedureSchema = z.object({
  key: slug,
  version: z.number().int().positive(),
  title: title(160),
  definition: procedureDefinitionSchema,
});
export type Procedure = z.infer<typeof procedureSchema>;

/** What the technician answered at one step; measure and firmware outcomes come from the engine. */
export const stepAnswerSchema = z.object({ stepId: slug, outcome: slug });
export type StepAnswer = z.infer<typeof stepAnswerSchema>;
