import { z } from 'zod';
import { pageNumber, pageSize } from './common';
import { decimalNumber, idNumber, wholeNumber } from './numbers';
import { nameText, text } from './text';

export const VISIT_STATUSES = ['draft', 'in_progress', 'closed', 'approved', 'returned', 'cancelled'] as const;
export const visitStatusSchema = z.enum(VISIT_STATUSES);
export type VisitStatus = z.infer<typeof visitStatusSchema>;

/** The visit status machine; the database enforces the same pairs with a trigger. */
export const VISIT_TRANSITIONS: Record<VisitStatus, readonly VisitStatus[]> = {
  draft: ['in_progress', 'cancelled'],
  in_progress: ['closed', 'cancelled'],
  closed: ['approved', 'returned'],
  returned: ['in_progress'],
  approved: [],
  cancelled: [],
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

const tick = (message: string) => z.literal(true, message);

/** Two-hand stations on the press: each kind has its own safety-distance rule (OSHA 1910.217(c)(3)(vii)(c), (viii)(c)). */
export const TWO_HAND_DEVICES = ['control', 'trip', 'not_fitted'] as const;
export type TwoHandDevice = (typeof TWO_HAND_DEVICES)[number];

/**
 * The post-repair checks before the press goes back to production. The crank-angle settings check is asked only after a sensor replacement or re-alignment: the server
 * requires it from the finding (`returnToServiceNeeds`), the form from the same function.
 */
export const returnToServiceSchema = z
  .object({
    faultCleared: tick('Confirm the fault has cleared on the control'),
    tdcAgrees: tick('Confirm the crank-angle display reads top dead centre with the slide at top'),
    crankAngleSettingsVerified: tick('Confirm every crank-angle setting was verified after the sensor work').optional(),
    guardsRefitted: tick('Confirm every guard, cover and enclosure door is back in place with its interlock working'),
    toolsRemoved: tick('Confirm every tool and die safety block is out of the press'),
    everyoneClear: tick('Confirm everyone was clear of the press before the first stroke'),
    singleStroke: tick('Confirm a single stroke stopped at the top without repeating'),
    stoppingTimeChecked: tick('Confirm the stopping time measured at about 90° on the downstroke is within the limit'),
    stoppingTimeMs: decimalNumber({ min: 0.001, max: 5000, message: 'Enter the stopping time in milliseconds, e.g. 180, or leave it empty', minMessage: 'The stopping time is above 0 ms' }).optional(),
    presenceSensingDistanceOk: z.enum(['yes', 'not_fitted'], 'Say whether the presence-sensing device still sits at a safe distance'),
    twoHandDevice: z.enum(TWO_HAND_DEVICES, 'Say whether the press has two-hand controls or two-hand trips'),
    twoHandDistanceOk: tick('Confirm every two-hand station sits at or beyond its safety distance').optional(),
    strokesPerMinute: decimalNumber({ min: 0.1, max: 2000, message: 'Enter the strokes per minute, e.g. 40', minMessage: 'Strokes per minute are above 0' }).optional(),
    engagingPoints: wholeNumber({ min: 1, max: 24, message: 'Enter the number of engaging points of the clutch, e.g. 4', minMessage: 'A clutch has at least 1 engaging point' }).optional(),
  })
  .superRefine((v, ctx) => {
    const need = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (v.twoHandDevice !== 'not_fitted' && v.twoHandDistanceOk !== true) need('twoHandDistanceOk', 'Confirm every two-hand station sits at or beyond its safety distance');
    if (v.twoHandDevice === 'control' && v.stoppingTimeMs === undefined) need('stoppingTimeMs', 'Enter the measured stopping time: the two-hand control distance is worked out from it');
    if (v.twoHandDevice === 'trip' && v.strokesPerMinute === undefined) need('strokesPerMinute', 'Enter the strokes per minute: the two-hand trip distance is worked out from it');
    if (v.twoHandDevice === 'trip' && v.engagingPoints === undefined) need('engagingPoints', 'Enter the engaging points of the clutch: the two-hand trip distance is worked out from it');
  });
export type ReturnToService = z.infer<typeof returnToServiceSchema>;

/** What a press left locked out waits for before it may run production again. */
export const LOCKED_OUT_WAITS_FOR = ['board', 'part', 'maker', 'other'] as const;
export type LockedOutWaitsFor = (typeof LOCKED_OUT_WAITS_FOR)[number];

export const lockedOutSchema = z
  .object({
    reason: text({ min: 3, minMessage: 'Say why the press cannot go back to production', max: 1000 }),
    waitsFor: z.enum(LOCKED_OUT_WAITS_FOR, 'Say what the press waits for'),
    waitsForDetail: text({ max: 200 }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.waitsFor === 'other' && !v.waitsForDetail?.trim()) ctx.addIssue({ code: 'custom', path: ['waitsForDetail'], message: 'Say what the press waits for' });
  });
export type LockedOut = z.infer<typeof lockedOutSchema>;

export const AS_LEFT_STATES = ['returned_to_production', 'locked_out'] as const;
export type AsLeftState = (typeof AS_LEFT_STATES)[number];

export const CAUSE_LABELS = {
  configuration: 'Configuration',
  wiring: 'Wiring or connector',
  firmware: 'Firmware',
  sensor: 'Sensor',
  cable: 'Cable',
  board: 'Processor board (escalated)',
  none_found: 'No fault found',
} as const;

const closeOutCommon = z.object({
  causeCategory: z.enum(['configuration', 'wiring', 'firmware', 'sensor', 'cable', 'board', 'none_found'], 'Choose the root cause'),
  actionsTaken: text({ min: 3, minMessage: 'Describe what you did', max: 4000 }),
  recommendations: text({ max: 4000 }).optional(),
  parts: z.array(partUsedSchema).max(50).default([]),
  labourMinutes: wholeNumber({ min: 0, max: 10_000, message: 'Enter the labour time in whole minutes, e.g. 90' }),
  travelMinutes: wholeNumber({ min: 0, max: 10_000, message: 'Enter the travel time in whole minutes, e.g. 45 (0 if none)' }),
  controlFirmwareLeft: versionText,
  monitorFirmwareLeft: versionText,
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

/**
 * The close-out says how the press was left. Returned to production needs the return-to-service
 * checks; left locked out needs the reason and what it waits for, and no such checks (the press
 * is not running). A returned-to-production close-out carries no locked-out detail and vice versa.
 */
export const closeOutSchema = z.discriminatedUnion(
  'asLeft',
  [
    closeOutCommon.extend({ asLeft: z.literal('returned_to_production'), returnToService: returnToServiceSchema }),
    closeOutCommon.extend({ asLeft: z.literal('locked_out'), lockedOut: lockedOutSchema }),
  ],
  'Say how the press was left: returned to production or left locked out',
);
export type CloseOutInput = z.infer<typeof closeOutSchema>;

export const CRANK_ANGLE_SETTINGS_REQUIRED = 'The sensor was replaced or re-aligned: confirm top stop, upstroke-only muting and cam outputs were verified';

/** The close-out for one visit: after sensor work (see `returnToServiceNeeds`) the crank-angle settings check is required. */
export function closeOutSchemaFor(needs: { crankAngleSettings: boolean }) {
  if (!needs.crankAngleSettings) return closeOutSchema;
  return closeOutSchema.superRefine((v, ctx) => {
    if (v.asLeft === 'returned_to_production' && v.returnToService.crankAngleSettingsVerified !== true) {
      ctx.addIssue({ code: 'custom', path: ['returnToService', 'crankAngleSettingsVerified'], message: CRANK_ANGLE_SETTINGS_REQUIRED });
    }
  });
}

export const cancelVisitSchema = z.object({
  reason: text({ min: 3, minMessage: 'Say why this visit is cancelled, e.g. started on the wrong press', max: 500 }),
});
export type CancelVisitInput = z.infer<typeof cancelVisitSchema>;

export const reviewDecisionSchema = z.object({
  decision: z.enum(['approve', 'return'], 'Approve the visit or return it'),
  comment: text({ min: 3, minMessage: 'Say what the technician should correct', max: 2000 }).optional(),
});
export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;
