import { CRANK_ANGLE_PROCEDURE } from '@shared/data/crank-angle-procedure';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { press } from './fixtures';

// Invented test data: no real company, person, press model or part number.

/**
 * An in-progress visit on the invented press PX-101 whose procedure reached the loose-connector
 * finding; the engine ranks wiring first. Override what a test needs to differ.
 */
export function visitAtFinding(overrides: Partial<VisitDetail> = {}): VisitDetail {
  return {
    id: 7,
    reference: 'V-000007',
    status: 'in_progress',
    faultDisplayed: 'E-417 crank angle invalid (invented)',
    technician: { id: 1, name: 'Ada Invented' },
    press: press(),
    causeCategory: null,
    startedAt: '2026-03-02T08:00:00.000Z',
    closedAt: null,
    createdAt: '2026-03-02T08:00:00.000Z',
    updatedAt: '2026-03-02T09:30:00.000Z',
    controlFirmwareFound: '2.10',
    monitorFirmwareFound: '3.1.4',
    controlFirmwareLeft: null,
    monitorFirmwareLeft: null,
    procedure: { id: 1, key: CRANK_ANGLE_PROCEDURE.key, version: CRANK_ANGLE_PROCEDURE.version, title: CRANK_ANGLE_PROCEDURE.title, definition: CRANK_ANGLE_PROCEDURE.definition },
    bandSet: null,
    availableBandSets: [],
    firmwareRules: [],
    stepResults: [],
    readings: [],
    traversal: {
      path: [
        { stepId: 'press-at-rest', kind: 'safety_gate', outcome: 'confirmed' },
        { stepId: 'connector-coupling', kind: 'inspect', outcome: 'loose_or_damaged' },
      ],
      currentStepId: null,
      required: null,
      findingIds: ['finding-connector'],
      noLongerApply: [],
      problems: [],
    },
    likelyCauses: {
      ranked: [
        { cause: 'wiring', score: 3, reasons: ['Finding reached: Circular connector loose or damaged.'] },
        { cause: 'sensor', score: 1, reasons: ['Invented weak evidence for a test.'] },
      ],
      ruledOut: [],
    },
    generationSuggestion: null,
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
    reviewComment: null,
    cancellation: null,
    version: 3,
    ...overrides,
  };
}
