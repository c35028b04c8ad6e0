import { z } from 'zod';
import { pageNumber, pageSize } from './common';
import { decimalNumber, idNumber, wholeNumber } from './numbers';
import { nameText, text } from './text';

export const VISIT_STATUSES = ['draft', 'in_progress', 'closed', 'approved', 'returned'] as const;
export const visitStatusSchema = z.enum(VISIT_STATUSES);
export type VisitStatus = z.infer<typeof visitStatusSchema>;

/** The visit status machine (DESIGN.md §3); the database enforces the same pairs with a trigger. */
export const VISIT_TRANSITIONS: Record<VisitStatus, readonly VisitStatus[]> = {
  draft: ['in_progress'],
  in_progress: ['closed'],
  closed: ['approved', 'returned'],
  returned: ['in_progress'],
  approved: [],
};

export function canMoveVisit(from: VisitStatus, to: VisitStatus): boolean {
  return VISIT_TRANSITIONS[from].includes(to);
}

const uuid = z.uuid('A client-made UUID identifies this save');
const versionText = z
  .string()
  .trim()
  .regex(/^\d{1,6}(\.\d{1,6}){0,5}$/, 'Type a dotted version such as 4.2 or 2.10.1')
  .optional()
  .or(z.literal('').transform(() => undefined));

export const visitCreateSchema = z.object({
  pressId: idNumber('Pick the press you are working on'),
  faultDisplayed: text({ min: 2, minMessage: 'Type the fault exactly as the control displays it', max: 500, maxMessage: 'Keep the fault text under 500 characters' }),
  controlFirmwareFound: versionText,
  monitorFirmwareFound: versionText,
  procedureKey: z.string().regex(/^[a-z0-9][a-z0-9-]*$/).default('crank-angle-sensor-circuit'),
});
export type VisitCreateInput = z.infer<typeof visitCreateSchema>;

export const visitListQuerySchema = z.object({
  status: visitStatusSchema.optional(),
  mine: z
    .enum(['true', 'false'])
    .optional()
    .transform((v) => v === 'true'),
  page: pageNumber.default(1),
  pageSize: pageSize(100).default(25),
});
export type VisitListQuery = z.infer<typeof visitListQuerySchema>;

export const visitStepParamsSchema = z.object({
  id: idNumber(),
  stepId: z.string().regex(/^[a-z0-9][a-z0-9_-]{0,62}$/, 'Unknown step'),
});

/** The technician's answer to one step. Measure and firmware outcomes are worked out by the server. */
export const stepAnswerInputSchema = z.object({
  id: uuid,
  outcome: nameText({ max: 64 }).optional(),
  /** A safety gate needs every confirmation ticked; the server records who and when. */
  confirmed: z.boolean().optional(),
  /** Only the keys the step declares are taken (checked against the pinned procedure by the server). */
  inputs: z
    .record(z.string().max(64, 'An input name is at most 64 characters'), text({ max: 200 }))
    .refine((inputs) => Object.keys(inputs).length <= 20, 'A step takes at most 20 inputs')
    .optional(),
  note: text({ max: 2000 }).optional(),
  /**
   * The id of the step's current answer the person saw (null: none yet). When another tab or device
   * answered the step since, the server answers 409 stale_version with its answer instead of overwriting it.
   */
  replaces: z.uuid('Reload the visit: the answer this one replaces is not known').nullable().optional(),
});
export type StepAnswerInput = z.infer<typeof stepAnswerInputSchema>;

export const readingSaveSchema = z.object({
  id: uuid,
  stepId: z.string().regex(/^[a-z0-9][a-z0-9_-]{0,62}$/),
  quantity: z.enum(['resistance', 'ac_voltage']),
  circuit: z.enum(['rotor', 'stator_1', 'stator_2']),
  position: z.enum(['control_end', 'sensor_end']),
  entered: nameText({ min: 1, minMessage: 'Type the meter reading, or OL for an open circuit', max: 40 }),
  /** The technician answered the question asked about this entry (a lone 1, or a winding below 1 Ω). */
  confirmed: z.boolean().optional(),
  /** The id of the reading this one replaces as the person saw it (null: none yet); 409 stale_version when that changed meanwhile. */
  replaces: z.uuid('Reload the visit: the reading this one replaces is not known').nullable().optional(),
  windingTemperatureC: z.number().min(-40).max(150).optional(),
  cable: z
    .object({
      awg: z.number().int().min(0).max(40),
      length: z.number().positive().max(10_000),
      lengthUnit: z.enum(['ft', 'm']),
      lengthIs: z.enum(['one_way', 'loop']),
      temperatureC: z.number().min(-40).max(150).optional(),
    })
    .optional(),
});
export type ReadingSaveInput = z.infer<typeof readingSaveSchema>;

export const partUsedSchema = z.object({
  id: uuid,
  partNumber: nameText({ min: 1, minMessage: 'Enter the part number from the label', max: 60 }),
  description: text({ max: 200 }).default(''),
  quantity: wholeNumber({ min: 1, max: 1000, message: 'Enter the quantity as a whole number, e.g. 1', minMessage: 'Quantity is at least 1' }),
  serialRemoved: nameText({ max: 60 }).optional(),
  serialFitted: nameText({ max: 60 }).optional(),
});
export type PartUsedInput = z.infer<typeof partUsedSchema>;

/** The post-repair checks before the press goes back to production (DESIGN.md §1, step 5). */
export const returnToServiceSchema = z.object({
  faultCleared: z.literal(true, 'Confirm the fault has cleared on the control'),
  tdcAgrees: z.literal(true, 'Confirm the crank-angle display reads top dead centre with the slide at top'),
  stoppingTimeChecked: z.literal(true, 'Confirm the stopping-time / brake-monitor check passed'),
  stoppingTimeMs: decimalNumber({ min: 0.001, max: 5000, message: 'Enter the stopping time in milliseconds, e.g. 180, or leave it empty', minMessage: 'The stopping time is above 0 ms' }).optional(),
  presenceSensingDistanceOk: z.enum(['yes', 'not_fitted'], 'Say whether the presence-sensing device still sits at a safe distance'),
});
export type ReturnToService = z.infer<typeof returnToServiceSchema>;

export const CAUSE_LABELS = {
  configuration: 'Configuration',
  wiring: 'Wiring or connector',
  firmware: 'Firmware',
  sensor: 'Sensor',
  cable: 'Cable',
  board: 'Processor board (escalated)',
  none_found: 'No fault found',
} as const;

export const closeOutSchema = z.object({
  causeCategory: z.enum(['configuration', 'wiring', 'firmware', 'sensor', 'cable', 'board', 'none_found'], 'Choose the root cause'),
  actionsTaken: text({ min: 3, minMessage: 'Describe what you did', max: 4000 }),
  recommendations: text({ max: 4000 }).optional(),
  parts: z.array(partUsedSchema).max(50).default([]),
  labourMinutes: wholeNumber({ min: 0, max: 10_000, message: 'Enter the labour time in whole minutes, e.g. 90' }),
  travelMinutes: wholeNumber({ min: 0, max: 10_000, message: 'Enter the travel time in whole minutes, e.g. 45 (0 if none)' }),
  controlFirmwareLeft: versionText,
  monitorFirmwareLeft: versionText,
  returnToService: returnToServiceSchema,
  contactName: nameText({ min: 2, minMessage: "Enter the name of the customer's contact who signs", max: 120 }),
  contactEmail: z.email('Enter the e-mail address the report goes to').max(200),
  /** The signature drawn on the tablet, as a PNG data URL. */
  signaturePng: z
    .string()
    .regex(/^data:image\/png;base64,[A-Za-z0-9+/=]+$/, 'Ask the customer to sign in the box')
    .max(2_000_000, 'The signature image is too large'),
  /** The visit's version the close-out was filled against; 409 stale_version when the visit changed since. */
  version: z.number().int().min(1).optional(),
  /** The finding the close-out reports; 409 finding_not_current when the path no longer ends there. */
  findingId: z.string().regex(/^[a-z0-9][a-z0-9_-]{0,62}$/).optional(),
});
export type CloseOutInput = z.infer<typeof closeOutSchema>;

export const reviewDecisionSchema = z.object({
  decision: z.enum(['approve', 'return'], 'Approve the visit or return it'),
  comment: text({ min: 3, minMessage: 'Say what the technician should correct', max: 2000 }).optional(),
});
export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;
