import type { Traversal } from '../../../shared/domain/traverse-procedure';
import type { BandSetRecord, PartRecord, ReadingRecord, StepResultRecord, VisitDetail, VisitSummary, VisitTraversal } from '../../../shared/schemas/visit-detail';
import type { BandSetVersion } from '../reference/reference.model';
import { toPressDto } from '../presses/presses.service';
import { visitReference } from '../../../shared/format/visit-reference';
import type { VisitContext } from './visit-context.service';
import { generationSuggestion, likelyCauses } from './visit-state';
import type { PartUsed, Reading, StepResult } from './visit-work.model';
import type { Visit } from './visits.model';

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

export function visitSummary(v: Visit): VisitSummary {
  return {
    id: v.id,
    reference: visitReference(v.id),
    status: v.status,
    faultDisplayed: v.faultDisplayed,
    technician: v.technician ? { id: v.technician.id, name: v.technician.name } : { id: v.technicianId, name: '' },
    press: v.press ? toPressDto(v.press) : null,
    causeCategory: v.causeCategory,
    startedAt: iso(v.startedAt),
    closedAt: iso(v.closedAt),
    createdAt: iso(v.createdAt)!,
    updatedAt: iso(v.updatedAt)!,
  };
}

export const stepResultDto = (r: StepResult): StepResultRecord => ({
  id: r.id,
  stepId: r.stepId,
  outcome: r.outcome,
  answer: r.answer,
  note: r.note,
  confirmedAt: iso(r.confirmedAt),
  createdBy: r.createdBy,
  createdAt: iso(r.createdAt)!,
  supersededAt: iso(r.supersededAt),
  supersededReason: r.supersededReason,
});

export const readingDto = (r: Reading): ReadingRecord => ({
  id: r.id,
  stepId: r.stepId,
  quantity: r.quantity,
  circuit: r.circuit,
  position: r.position,
  entered: r.entered,
  valueSi: r.valueSi,
  isOpen: r.isOpen,
  windingTemperatureC: r.windingTemperatureC,
  cable: r.cable,
  verdict: r.verdict,
  reason: r.reason,
  judgement: r.judgement,
  bandSetId: r.bandSetId,
  createdAt: iso(r.createdAt)!,
  supersededAt: iso(r.supersededAt),
});

const partDto = (p: PartUsed): PartRecord => ({
  id: p.id,
  partNumber: p.partNumber,
  description: p.description,
  quantity: p.quantity,
  serialRemoved: p.serialRemoved,
  serialFitted: p.serialFitted,
});

const bandSetDto = (b: BandSetVersion): BandSetRecord => ({ id: b.id, generation: b.generation, version: b.version, label: b.label, bands: b.bands, publishedAt: iso(b.publishedAt) });

function traversalDto(t: Traversal): VisitTraversal {
  return {
    path: t.path,
    currentStepId: t.current?.id ?? null,
    required: t.required,
    findingIds: t.findings.map((f) => f.id),
    /** Answers kept in history that no longer apply after an earlier answer changed. */
    noLongerApply: t.unusedAnswers.map((a) => a.stepId),
    problems: t.problems,
  };
}

/** The whole visit as the workspace, the close-out and the review read it. */
export function visitDetail(ctx: VisitContext, traversal: Traversal, extra: { parts: PartUsed[]; publishedBandSets: BandSetVersion[] }): VisitDetail {
  const v = ctx.visit;
  return {
    ...visitSummary(v),
    controlFirmwareFound: v.controlFirmwareFound,
    monitorFirmwareFound: v.monitorFirmwareFound,
    controlFirmwareLeft: v.controlFirmwareLeft,
    monitorFirmwareLeft: v.monitorFirmwareLeft,
    procedure: { id: ctx.procedure.id, key: ctx.procedure.key, version: ctx.procedure.version, title: ctx.procedure.title, definition: ctx.definition },
    bandSet: ctx.bandSet ? bandSetDto(ctx.bandSet) : null,
    availableBandSets: extra.publishedBandSets.map(bandSetDto),
    firmwareRules: ctx.rules,
    stepResults: ctx.results.map(stepResultDto),
    readings: ctx.readings.map(readingDto),
    traversal: traversalDto(traversal),
    likelyCauses: likelyCauses(ctx, traversal),
    generationSuggestion: generationSuggestion(
      ctx,
      extra.publishedBandSets.map((b) => ({ generation: b.generation, values: b.bands })),
    ),
    closeOut: {
      causeCategory: v.causeCategory,
      actionsTaken: v.actionsTaken,
      recommendations: v.recommendations,
      labourMinutes: v.labourMinutes,
      travelMinutes: v.travelMinutes,
      asLeftState: v.asLeftState,
      returnToService: v.returnToService,
      lockedOut: v.lockedOut,
      contactName: v.contactName,
      contactEmail: v.contactEmail,
      signedAt: iso(v.signedAt),
      parts: extra.parts.map(partDto),
    },
    reviewComment: v.reviewComment,
    cancellation: v.cancelledAt ? { at: v.cancelledAt.toISOString(), reason: v.cancelReason ?? '' } : null,
    version: v.version,
  };
}

export type VisitDetailDto = VisitDetail;
