import { z } from 'zod';
import { CAPACITY_UNITS } from '../format/capacity';
import { STEP_KINDS } from './procedure';
import { causeCategorySchema, circuitSchema, positionSchema, quantitySchema, verdictSchema } from './reading';
import { LOCKED_OUT_WAITS_FOR, visitStatusSchema } from './visit';

// One visit record, built on the server from a visit and rendered as it is by the manager's record
// page, the customer's report page, the PDF and the e-mail. Dates are ISO strings; the renderings
// format them with shared/format in `timeZone`. Labels and sentences are already in words here, so
// a wording changes in the builder or in shared/format, never in a rendering.

const iso = z.string();

export const recordHeaderSchema = z.object({
  visitId: z.number().int(),
  /** "V-000123" */
  reference: z.string(),
  status: visitStatusSchema,
  statusLabel: z.string(),
  /** Set when the visit was cancelled: "Cancelled 2 Dec 2026 by …: started on the wrong press". */
  cancellation: z.object({ at: iso, by: z.string().nullable(), reason: z.string() }).nullable(),
  customer: z.object({ name: z.string() }),
  site: z.object({ name: z.string(), address: z.string().nullable(), city: z.string().nullable() }),
  /** "Harlow …, 400 Foundry Road, …" */
  siteLine: z.string(),
  press: z.object({ assetTag: z.string(), model: z.string(), tonnage: z.number(), capacityUnit: z.enum(CAPACITY_UNITS), controlModel: z.string().nullable(), sensorGeneration: z.string().nullable() }),
  /** "HS-P07, SR-250 …, 250 US tons, sensor generation demo-gen-1" (capacity in the customer's unit) */
  pressLine: z.string(),
  technician: z.object({ name: z.string() }),
  startedAt: iso.nullable(),
  closedAt: iso.nullable(),
  faultDisplayed: z.string(),
  procedure: z.object({ title: z.string(), version: z.number().int() }),
  bandSet: z.object({ label: z.string(), generation: z.string(), version: z.number().int(), referenceTemperatureC: z.number(), invented: z.boolean() }).nullable(),
  /** "Demo generation 1 (invented), version 1 (invented demo values)" or "None chosen". */
  bandSetLine: z.string(),
});

/** How the press was left; `headline` is the first line of every rendering of a closed visit. */
export const asLeftSchema = z.discriminatedUnion('state', [
  z.object({
    state: z.literal('returned_to_production'),
    /** "Press returned to production" */
    headline: z.string(),
    /** The checks confirmed before production, each as a sentence. */
    checks: z.array(
      z.object({
        key: z.enum(['faultCleared', 'tdcAgrees', 'crankAngleSettings', 'guardsRefitted', 'toolsRemoved', 'everyoneClear', 'singleStroke', 'stoppingTimeChecked', 'presenceSensing', 'twoHand']),
        text: z.string(),
      }),
    ),
    stoppingTimeMs: z.number().nullable(),
    /** The minimum safety distance of each safeguarding device, worked out from the figures given, as sentences. */
    distances: z.array(z.string()),
  }),
  z.object({
    state: z.literal('locked_out'),
    /** "Press left locked out: not fit for production until …" */
    headline: z.string(),
    reason: z.string(),
    waitsFor: z.enum(LOCKED_OUT_WAITS_FOR),
  }),
]);

export const recordReadingSchema = z.object({
  id: z.string(),
  stepId: z.string(),
  stepTitle: z.string(),
  circuit: circuitSchema,
  /** "Rotor R1–R2" */
  circuitLabel: z.string(),
  quantity: quantitySchema,
  quantityLabel: z.string(),
  position: positionSchema,
  positionLabel: z.string(),
  entered: z.string(),
  /** The value the band was compared with (after cable and temperature), e.g. "49.39 Ω". */
  judgedValue: z.string().nullable(),
  /** The band of the pinned band-set version, in words; null without a band set. */
  band: z.string().nullable(),
  verdict: verdictSchema.nullable(),
  verdictLabel: z.string(),
  reason: z.string(),
  /** Temperature correction applied, when a winding temperature was given. */
  temperature: z.string().nullable(),
  /** Cable allowance subtracted, when the cable was described. */
  cable: z.string().nullable(),
});

export const recordPathStepSchema = z.object({
  stepId: z.string(),
  title: z.string(),
  kind: z.enum(STEP_KINDS),
  /** The outcome in the procedure's words. */
  answer: z.string(),
  /** Safety gates: what was confirmed, when and by whom. */
  confirmations: z.array(z.string()),
  confirmedAt: iso.nullable(),
  confirmedBy: z.string().nullable(),
  details: z.array(z.string()),
  note: z.string().nullable(),
});

export const recordFindingSchema = z.object({ title: z.string(), conclusion: z.string(), recommendedAction: z.string(), escalate: z.boolean() });

export const recordPartSchema = z.object({
  id: z.string(),
  partNumber: z.string(),
  description: z.string(),
  quantity: z.number(),
  serialRemoved: z.string().nullable(),
  serialFitted: z.string().nullable(),
});

// Only the signal words for hazards to people: NOTICE (damage to equipment) is not listed in the record.
export const recordSafetySchema = z.object({ signalWord: z.enum(['DANGER', 'WARNING', 'CAUTION']), text: z.string(), appliedAt: z.array(z.string()) });

export const recordAcknowledgementSchema = z.object({ at: iso, by: z.string().nullable() });

export const visitRecordSchema = z.object({
  /** The IANA zone every date of this record is shown in (REPORT_TIME_ZONE). */
  timeZone: z.string(),
  companyName: z.string(),
  header: recordHeaderSchema,
  /** The report issue the record was built for (the customer's link), or the newest one on the office's record. */
  issue: z.object({ number: z.number().int(), corrected: z.boolean(), issuedAt: iso, expiresAt: iso }).nullable(),
  /** "Service report V-000123", or "Corrected service report …" from issue 2 on. */
  title: z.string(),
  path: z.object({
    steps: z.array(recordPathStepSchema),
    finding: recordFindingSchema.nullable(),
    /** Answers kept in the history that no longer apply after an earlier answer changed. */
    noLongerApply: z.number().int(),
  }),
  readings: z.object({
    /** Current readings of the steps on the path taken. */
    items: z.array(recordReadingSchema),
    /** Readings typed again during the visit; the earlier values stay in the history. */
    replaced: z.number().int(),
  }),
  work: z.object({
    cause: z.object({ category: causeCategorySchema.nullable(), label: z.string() }),
    actionsTaken: z.string().nullable(),
    recommendations: z.string().nullable(),
    firmware: z.object({ controlFound: z.string().nullable(), controlLeft: z.string().nullable(), monitorFound: z.string().nullable(), monitorLeft: z.string().nullable() }),
  }),
  parts: z.array(recordPartSchema),
  times: z.object({ labourMinutes: z.number().nullable(), travelMinutes: z.number().nullable(), repairMinutes: z.number().nullable() }),
  /** Null until the close-out is recorded. */
  asLeft: asLeftSchema.nullable(),
  safety: z.array(recordSafetySchema),
  photos: z.array(z.object({ id: z.string(), caption: z.string().nullable(), stepTitle: z.string().nullable(), hasThumb: z.boolean() })),
  signOff: z.object({
    contactName: z.string().nullable(),
    contactEmail: z.string().nullable(),
    signedAt: iso.nullable(),
    signatureId: z.string().nullable(),
    acknowledgement: recordAcknowledgementSchema.nullable(),
  }),
});

export type VisitRecord = z.infer<typeof visitRecordSchema>;
export type RecordHeader = z.infer<typeof recordHeaderSchema>;
export type AsLeft = z.infer<typeof asLeftSchema>;
export type RecordReading = z.infer<typeof recordReadingSchema>;
export type RecordPathStep = z.infer<typeof recordPathStepSchema>;
export type RecordPart = z.infer<typeof recordPartSchema>;
export type RecordAcknowledgement = z.infer<typeof recordAcknowledgementSchema>;

/** The office's record: the same model plus what only the office sees. */
export const officeVisitRecordSchema = z.object({ record: visitRecordSchema, reviewComment: z.string().nullable() });
export type OfficeVisitRecord = z.infer<typeof officeVisitRecordSchema>;
