import { CRANK_ANGLE_PROCEDURE } from '@shared/data/crank-angle-procedure';
import { evidenceFromPath, rankLikelyCauses } from '@shared/domain/likely-cause';
import { traverseProcedure } from '@shared/domain/traverse-procedure';
import type { BandSetRecord, ReadingRecord, StepResultRecord, VisitDetail, VisitSummary } from '@shared/schemas/visit-detail';
import type { VisitStatus } from '@shared/schemas/visit';
import { press, technician } from '@/testing/fixtures';

// INVENTED test data: no real company, person, press, sensor or band value. The band values are
// made up so that a test can say which way a reading falls without arithmetic.
export const INVENTED_BAND_SET: BandSetRecord = {
  id: 7,
  generation: 'test-gen-a',
  version: 1,
  label: 'Test generation A (invented)',
  publishedAt: '2026-01-01T00:00:00.000Z',
  bands: {
    label: 'Test generation A (invented)',
    referenceTemperatureC: 20,
    windings: {
      rotor: { nominal: 90, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 9, openAbove: 2000 },
      stator_1: { nominal: 45, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 4.5, openAbove: 2000 },
      stator_2: { nominal: 45, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 4.5, openAbove: 2000 },
    },
    statorBalancePercent: 5,
    excitation: { min: 4, max: 4.5, nearEdgePercent: 5 },
    statorOutputMagnitude: { min: 2, max: 2.5, nearEdgePercent: 5 },
    invented: true,
    note: 'Invented for tests.',
  },
};

export const INVENTED_BAND_SET_B: BandSetRecord = {
  ...INVENTED_BAND_SET,
  id: 8,
  generation: 'test-gen-b',
  label: 'Test generation B (invented)',
  bands: { ...INVENTED_BAND_SET.bands, label: 'Test generation B (invented)' },
};

export const ANSWERED_AT = '2026-03-02T12:00:00.000Z';

export interface AnswerSpec {
  stepId: string;
  outcome: string;
  inputs?: Record<string, string>;
  reason?: string;
}

/** The answers that lead, with everything sound, to the resistance test at the control end. */
export const UP_TO_RESISTANCE: AnswerSpec[] = [
  { stepId: 'press-at-rest', outcome: 'confirmed' },
  { stepId: 'firmware-versions', outcome: 'compatible', inputs: { press_control_version: '2.10', monitor_module_version: '3.1.4' }, reason: 'Invented rule: 2.10 with 3.1.4 is compatible.' },
  { stepId: 'lockout', outcome: 'confirmed' },
  { stepId: 'identify-generation', outcome: 'nameplate', inputs: { sensor_generation: 'test-gen-a' } },
  { stepId: 'monitor-jumper', outcome: 'yes' },
  { stepId: 'connector-coupling', outcome: 'secure' },
  { stepId: 'wiring-conductors', outcome: 'sound' },
];

function result(a: AnswerSpec, supersededAt: string | null = null): StepResultRecord {
  const gate = a.stepId === 'press-at-rest' || a.stepId === 'lockout' || a.stepId === 'reconnect-for-live';
  return {
    id: `result-${a.stepId}-${a.outcome}${supersededAt ? '-old' : ''}`,
    stepId: a.stepId,
    outcome: a.outcome,
    answer: { ...(a.inputs ? { inputs: a.inputs } : {}), ...(a.reason ? { reason: a.reason } : {}) },
    note: null,
    confirmedAt: gate ? ANSWERED_AT : null,
    createdBy: technician.id,
    createdAt: ANSWERED_AT,
    supersededAt,
    supersededReason: supersededAt ? `Answer changed by ${technician.name}` : null,
  };
}

export function readingRecord(overrides: Partial<ReadingRecord> = {}): ReadingRecord {
  return {
    id: 'reading-1',
    stepId: 'resistance-control-end',
    quantity: 'resistance',
    circuit: 'rotor',
    position: 'control_end',
    entered: '89.3',
    valueSi: 89.3,
    isOpen: false,
    windingTemperatureC: null,
    cable: null,
    verdict: 'in_band',
    reason: '89.3 Ω is 0.78 % below nominal 90 Ω, within ±8 %.',
    judgement: { status: 'awaiting' },
    bandSetId: INVENTED_BAND_SET.id,
    createdAt: ANSWERED_AT,
    supersededAt: null,
    ...overrides,
  };
}

interface VisitOptions {
  id?: number;
  status?: VisitStatus;
  answers?: AnswerSpec[];
  /** Earlier answers that were replaced (kept as history). */
  superseded?: AnswerSpec[];
  readings?: ReadingRecord[];
  bandSet?: BandSetRecord | null;
  generationSuggestion?: VisitDetail['generationSuggestion'];
  reviewComment?: string | null;
  version?: number;
}

/** A visit as GET /api/visits/:id sends it, with the path worked out by the real traversal engine. */
export function visitDetail(options: VisitOptions = {}): VisitDetail {
  const { id = 42, status = 'in_progress', answers = [], superseded = [], readings = [], bandSet = INVENTED_BAND_SET } = options;
  const definition = CRANK_ANGLE_PROCEDURE.definition;
  const t = traverseProcedure(definition, answers.map(({ stepId, outcome }) => ({ stepId, outcome })));
  return {
    ...visitSummary({ id, status }),
    controlFirmwareFound: '2.10',
    monitorFirmwareFound: '3.1.4',
    controlFirmwareLeft: null,
    monitorFirmwareLeft: null,
    procedure: { id: 1, key: CRANK_ANGLE_PROCEDURE.key, version: 1, title: CRANK_ANGLE_PROCEDURE.title, definition },
    bandSet,
    availableBandSets: [INVENTED_BAND_SET, INVENTED_BAND_SET_B],
    firmwareRules: [],
    stepResults: [...superseded.map((a) => result(a, '2026-03-02T12:30:00.000Z')), ...answers.map((a) => result(a))],
    readings,
    traversal: {
      path: t.path,
      currentStepId: t.current?.id ?? null,
      required: t.required,
      findingIds: t.findings.map((f) => f.id),
      noLongerApply: t.unusedAnswers.map((a) => a.stepId),
      problems: t.problems,
    },
    likelyCauses: rankLikelyCauses(evidenceFromPath(definition, t.path, t.findings[0]?.id)),
    generationSuggestion: options.generationSuggestion ?? null,
    closeOut: {
      causeCategory: null,
      actionsTaken: null,
      recommendations: null,
      labourMinutes: null,
      travelMinutes: null,
      asLeftState: null,
      returnToService: null,
      lockedOut: null,
      contactName: null,
      contactEmail: null,
      signedAt: null,
      parts: [],
    },
    reviewComment: options.reviewComment ?? null,
    cancellation: null,
    version: options.version ?? 1,
  };
}

export function visitSummary(overrides: Partial<VisitSummary> = {}): VisitSummary {
  return {
    id: 42,
    reference: `V-${String(overrides.id ?? 42).padStart(6, '0')}`,
    status: 'in_progress',
    faultDisplayed: 'E-217 crank angle signal lost (invented code)',
    technician: { id: technician.id, name: technician.name },
    press: press(),
    causeCategory: null,
    startedAt: '2026-03-02T11:00:00.000Z',
    closedAt: null,
    createdAt: '2026-03-02T11:00:00.000Z',
    updatedAt: '2026-03-02T11:00:00.000Z',
    ...overrides,
  };
}
