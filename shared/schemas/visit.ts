import { z } from 'zod';

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

/** One wording for a visit's status everywhere: screens, CSV export, report. */
export const VISIT_STATUS_LABELS: Record<VisitStatus, string> = {
  draft: 'Draft',
  in_progress: 'In progress',
  closed: 'Closed — awaiting review',
  approved: 'Approved',
  returned: 'Returned for correction',
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
  pressId: z.coerce.number().int().positive('Pick the press you are working on'),
  faultDisplayed: z
    .string()
    .trim()
    .min(2, 'Type the fault exactly as the control displays it')
    .max(500, 'Keep the fault text under 500 characters'),
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
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type VisitListQuery = z.infer<typeof visitListQuerySchema>;

export const visitStepParamsSchema = z.object({
  id: z.coerce.number().int().positive(),
  stepId: z.string().regex(/^[a-z0-9][a-z0-9_-]{0,62}$/, 'Unknown step'),
});

/** The technician's answer to one step. Measure and firmware outcomes are worked out by the server. */
export const stepAnswerInputSchema = z.object({
  id: uuid,
  outcome: z.string().max(64).optional(),
  /** A safety gate needs every confirmation ticked; the server records who and when. */
  confirmed: z.boolean().optional(),
  /** Only the keys the step declares are taken (checked against the pinned procedure by the server). */
  inputs: z
    .record(z.string().max(64, 'An input name is at most 64 characters'), z.string().trim().max(200, 'Keep each input under 200 characters'))
    .refine((inputs) => Object.keys(inputs).length <= 20, 'A step takes at most 20 inputs')
    .optional(),
  note: z.string().trim().max(2000).optional(),
});
export type StepAnswerInput = z.infer<typeof stepAnswerInputSchema>;

export const readingSaveSchema = z.object({
  id: uuid,
  stepId: z.string().regex(/^[a-z0-9][a-z0-9_-]{0,62}$/),
  quantity: z.enum(['resistance', 'ac_voltage']),
  circuit: z.enum(['rotor', 'stator_1', 'stator_2']),
  position: z.enum(['control_end', 'sensor_end']),
  entered: z.string().trim().min(1, 'Type the meter reading, or OL for an open circuit').max(40),
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
  partNumber: z.string().trim().min(1, 'Enter the part number from the label').max(60),
  description: z.string().trim().max(200).default(''),
  quantity: z.coerce.number().int('Quantity is a whole number').min(1, 'Quantity is at least 1').max(1000),
  serialRemoved: z.string().trim().max(60).optional(),
  serialFitted: z.string().trim().max(60).optional(),
});
export type PartUsedInput = z.infer<typeof partUsedSchema>;

/** The post-repair checks before the press goes back to production (DESIGN.md §1, step 5). */
export const returnToServiceSchema = z.object({
  faultCleared: z.literal(true, 'Confirm the fault has cleared on the control'),
  tdcAgrees: z.literal(true, 'Confirm the crank-angle display reads top dead centre with the slide at top'),
  stoppingTimeChecked: z.literal(true, 'Confirm the stopping-time / brake-monitor check passed'),
  stoppingTimeMs: z.coerce.number().positive().max(5000).optional(),
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
  actionsTaken: z.string().trim().min(3, 'Describe what you did').max(4000),
  recommendations: z.string().trim().max(4000).optional(),
  parts: z.array(partUsedSchema).max(50).default([]),
  labourMinutes: z.coerce.number().int('Whole minutes').min(0).max(10_000),
  travelMinutes: z.coerce.number().int('Whole minutes').min(0).max(10_000),
  controlFirmwareLeft: versionText,
  monitorFirmwareLeft: versionText,
  returnToService: returnToServiceSchema,
  contactName: z.string().trim().min(2, "Enter the name of the customer's contact who signs").max(120),
  contactEmail: z.email('Enter the e-mail address the report goes to').max(200),
  /** The signature drawn on the tablet, as a PNG data URL. */
  signaturePng: z
    .string()
    .regex(/^data:image\/png;base64,[A-Za-z0-9+/=]+$/, 'Ask the customer to sign in the box')
    .max(2_000_000, 'The signature image is too large'),
});
export type CloseOutInput = z.infer<typeof closeOutSchema>;

export const reviewDecisionSchema = z.object({
  decision: z.enum(['approve', 'return'], 'Approve the visit or return it'),
  comment: z.string().trim().min(3, 'Say what the technician should correct').max(2000).optional(),
});
export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;
