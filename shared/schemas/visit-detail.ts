// Response shapes of the visit API, shared so the client reads exactly what the server sends.
import type { GenerationInference } from '../domain/infer-generation';
import type { CauseRanking } from '../domain/likely-cause';
import type { Requirement } from '../domain/traverse-procedure';
import type { BandSetValues } from './band-set';
import type { FirmwareRule } from './firmware-rule';
import type { Press } from './press';
import type { ProcedureDefinition, Step } from './procedure';
import type { Cable, CauseCategory, Circuit, Position, Quantity, Verdict } from './reading';
import type { AsLeftState, LockedOut, ReturnToService, VisitStatus } from './visit';

export interface VisitSummary {
  id: number;
  /** What people say and print: V-000123. */
  reference: string;
  status: VisitStatus;
  faultDisplayed: string;
  technician: { id: number; name: string };
  press: Press | null;
  causeCategory: CauseCategory | null;
  startedAt: string | null;
  closedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface StepResultRecord {
  id: string;
  stepId: string;
  outcome: string | null;
  answer: Record<string, unknown>;
  note: string | null;
  confirmedAt: string | null;
  createdBy: number;
  createdAt: string;
  supersededAt: string | null;
  supersededReason: string | null;
}

export interface ReadingRecord {
  id: string;
  stepId: string;
  quantity: Quantity;
  circuit: Circuit;
  position: Position;
  entered: string;
  valueSi: number | null;
  isOpen: boolean;
  windingTemperatureC: number | null;
  cable: Cable | null;
  /** The server's verdict; null while it cannot be judged (no generation yet, or a stator awaiting its partner). */
  verdict: Verdict | null;
  reason: string;
  judgement: Record<string, unknown>;
  bandSetId: number | null;
  createdAt: string;
  supersededAt: string | null;
}

export interface BandSetRecord {
  id: number;
  generation: string;
  version: number;
  label: string;
  bands: BandSetValues;
  publishedAt: string | null;
}

export interface PartRecord {
  id: string;
  partNumber: string;
  description: string;
  quantity: number;
  serialRemoved: string | null;
  serialFitted: string | null;
}

export interface VisitTraversal {
  path: Array<{ stepId: string; kind: Step['kind']; outcome: string }>;
  currentStepId: string | null;
  required: Requirement | null;
  findingIds: string[];
  /** Steps whose answers are kept in history but no longer apply after an earlier answer changed. */
  noLongerApply: string[];
  problems: string[];
}

export interface VisitDetail extends VisitSummary {
  controlFirmwareFound: string | null;
  monitorFirmwareFound: string | null;
  controlFirmwareLeft: string | null;
  monitorFirmwareLeft: string | null;
  procedure: { id: number; key: string; version: number; title: string; definition: ProcedureDefinition };
  bandSet: BandSetRecord | null;
  availableBandSets: BandSetRecord[];
  firmwareRules: FirmwareRule[];
  stepResults: StepResultRecord[];
  readings: ReadingRecord[];
  traversal: VisitTraversal;
  likelyCauses: CauseRanking;
  generationSuggestion: GenerationInference | null;
  closeOut: CloseOutFacts & { signedAt: string | null; parts: PartRecord[] };
  reviewComment: string | null;
  /** Set once the visit was cancelled (started by mistake); it is kept for the record. */
  cancellation: { at: string; reason: string } | null;
  /** Bumped with every write to the visit; a close-out sends the version it was filled against. */
  version: number;
}

/** What the close-out stored on a visit (the detail's `closeOut` and the record's source share it). */
export interface CloseOutFacts {
  causeCategory: CauseCategory | null;
  actionsTaken: string | null;
  recommendations: string | null;
  labourMinutes: number | null;
  travelMinutes: number | null;
  asLeftState: AsLeftState | null;
  returnToService: ReturnToService | null;
  lockedOut: LockedOut | null;
  contactName: string | null;
  contactEmail: string | null;
}

/** `error.current` of a 409 stale_version: what the server holds now, to show beside what the person sent. */
export interface StaleVersionCurrent {
  visit: VisitDetail;
  /** A step answer's conflict: the step's answer on the server (null: none any more). */
  stepResult?: StepResultRecord | null;
  /** A reading's conflict: the reading on the server for that winding and place (null: none any more). */
  reading?: ReadingRecord | null;
}
