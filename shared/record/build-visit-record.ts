import { formatSi } from '../domain/format-quantity';
import type { EntryJudgement, ResistanceFigures, VoltageFigures } from '../domain/judge-entry';
import { traverseProcedure } from '../domain/traverse-procedure';
import { RETURN_TO_SERVICE } from '../data/safety-messages';
import { formatCapacity, type CapacityUnit } from '../format/capacity';
import { visitReference } from '../format/visit-reference';
import { circuitLabel, POSITION_LABELS, QUANTITY_LABELS, verdictLabel, VISIT_STATUS_LABELS } from '../format/labels';
import type { BandSetValues } from '../schemas/band-set';
import type { ProcedureDefinition, SafetyMessage, Step } from '../schemas/procedure';
import { CAUSE_LABELS, type ReturnToService, type VisitStatus } from '../schemas/visit';
import { returnToServiceDistances } from '../domain/return-to-service';
import type { AsLeft, RecordPathStep, RecordReading, VisitRecord } from '../schemas/visit-record';
import type { CloseOutFacts, ReadingRecord } from '../schemas/visit-detail';
import { AS_LEFT_HEADLINES, bandLine, distanceLine, RECORD_WORDS, RETURN_TO_SERVICE_CHECKS, WAITS_FOR_WORDS } from './record-wording';

/** What the server reads for one visit, as plain values: the builder below turns it into the record. */
export interface VisitRecordSource {
  companyName: string;
  timeZone: string;
  visit: CloseOutFacts & {
    id: number;
    status: VisitStatus;
    faultDisplayed: string;
    startedAt: string | null;
    closedAt: string | null;
    signedAt: string | null;
    cancellation: { at: string; by: string | null; reason: string } | null;
    controlFirmwareFound: string | null;
    controlFirmwareLeft: string | null;
    monitorFirmwareFound: string | null;
    monitorFirmwareLeft: string | null;
  };
  customer: { name: string };
  site: { name: string; address: string | null; city: string | null };
  press: { assetTag: string; model: string; tonnage: number; capacityUnit: CapacityUnit; controlModel: string | null; sensorGeneration: string | null };
  technicianName: string;
  procedure: { title: string; version: number; definition: ProcedureDefinition };
  bandSet: { label: string; generation: string; version: number; bands: BandSetValues } | null;
  /** Every step result, oldest first, with superseded ones. */
  results: { stepId: string; outcome: string | null; inputs: Record<string, unknown>; note: string | null; confirmedAt: string | null; createdBy: number; supersededAt: string | null }[];
  /** Every reading, oldest first, with superseded ones. */
  readings: Pick<ReadingRecord, 'id' | 'stepId' | 'quantity' | 'circuit' | 'position' | 'entered' | 'windingTemperatureC' | 'cable' | 'verdict' | 'reason' | 'judgement' | 'supersededAt'>[];
  parts: { id: string; partNumber: string; description: string; quantity: number; serialRemoved: string | null; serialFitted: string | null }[];
  /** Photos and signatures, oldest first. */
  attachments: { id: string; kind: 'photo' | 'signature'; caption: string | null; stepId: string | null; hasThumb: boolean }[];
  /** Names of the people who recorded step results, by user id. */
  people: Record<number, string>;
  issue: { number: number; issuedAt: string; expiresAt: string; acknowledgedAt: string | null; acknowledgedBy: string | null } | null;
}

export const reportTitle = (reference: string, corrected: boolean) => `${corrected ? 'Corrected service report' : 'Service report'} ${reference}`;

function pressLine(p: VisitRecordSource['press']): string {
  return [p.assetTag, p.model, formatCapacity(p.tonnage, p.capacityUnit), p.controlModel, p.sensorGeneration ? `sensor generation ${p.sensorGeneration}` : null].filter(Boolean).join(', ');
}

function readingOf(src: VisitRecordSource, stepTitles: Map<string, string>, r: VisitRecordSource['readings'][number]): RecordReading {
  const j = r.judgement as unknown as EntryJudgement;
  const figures = j?.status === 'judged' ? j.figures : null;
  const resistance = figures?.kind === 'resistance' ? (figures as ResistanceFigures) : null;
  const judged = resistance ? resistance.atReference : figures?.kind === 'ac_voltage' ? (figures as VoltageFigures).judged : null;
  let temperature: string | null = null;
  if (r.windingTemperatureC !== null && resistance?.atReference != null) {
    temperature = `Winding at ${r.windingTemperatureC} °C; corrected to ${resistance.referenceTemperatureC} °C: ${formatSi(resistance.atReference, 'resistance')}`;
  }
  let cable: string | null = null;
  if (resistance?.cable && r.cable) {
    const run = `${r.cable.length} ${r.cable.lengthUnit} ${r.cable.lengthIs === 'loop' ? 'loop' : 'one way'}`;
    cable = `AWG ${r.cable.awg} cable, ${run}: ${formatSi(resistance.cable.resistance, 'resistance')} subtracted (winding ${formatSi(resistance.winding ?? 0, 'resistance')})`;
  } else if (r.cable) {
    cable = 'Taken at the sensor end: no cable allowance.';
  }
  return {
    id: r.id,
    stepId: r.stepId,
    stepTitle: stepTitles.get(r.stepId) ?? r.stepId,
    circuit: r.circuit,
    circuitLabel: circuitLabel(r.circuit),
    quantity: r.quantity,
    quantityLabel: QUANTITY_LABELS[r.quantity],
    position: r.position,
    positionLabel: POSITION_LABELS[r.position],
    entered: r.entered,
    judgedValue: typeof judged === 'number' ? formatSi(judged, r.quantity) : null,
    band: src.bandSet ? bandLine(src.bandSet.bands, r.circuit, r.quantity) : null,
    verdict: r.verdict,
    verdictLabel: verdictLabel(r.verdict),
    reason: r.reason,
    temperature,
    cable,
  };
}

type ReturnedChecks = Extract<AsLeft, { state: 'returned_to_production' }>['checks'];

function returnedChecks(rts: ReturnToService): ReturnedChecks {
  const checks: ReturnedChecks = [];
  const C = RETURN_TO_SERVICE_CHECKS;
  // Visits closed before the fuller list was asked keep only the checks they confirmed.
  if (rts.faultCleared) checks.push({ key: 'faultCleared', text: C.faultCleared });
  if (rts.tdcAgrees) checks.push({ key: 'tdcAgrees', text: C.tdcAgrees });
  if (rts.crankAngleSettingsVerified) checks.push({ key: 'crankAngleSettings', text: C.crankAngleSettings });
  if (rts.guardsRefitted) checks.push({ key: 'guardsRefitted', text: C.guardsRefitted });
  if (rts.toolsRemoved) checks.push({ key: 'toolsRemoved', text: C.toolsRemoved });
  if (rts.everyoneClear) checks.push({ key: 'everyoneClear', text: C.everyoneClear });
  if (rts.singleStroke) checks.push({ key: 'singleStroke', text: C.singleStroke });
  if (rts.stoppingTimeChecked) checks.push({ key: 'stoppingTimeChecked', text: C.stoppingTimeChecked });
  checks.push({ key: 'presenceSensing', text: rts.presenceSensingDistanceOk === 'yes' ? C.presenceSensingOk : C.presenceSensingNotFitted });
  if (rts.twoHandDevice) {
    const twoHand = { control: C.twoHandControlOk, trip: C.twoHandTripOk, not_fitted: C.twoHandNotFitted }[rts.twoHandDevice];
    checks.push({ key: 'twoHand', text: twoHand });
  }
  return checks;
}

function asLeftOf(visit: VisitRecordSource['visit']): AsLeft | null {
  if (visit.asLeftState === 'locked_out' && visit.lockedOut) {
    const { reason, waitsFor, waitsForDetail } = visit.lockedOut;
    const until = waitsFor === 'other' ? (waitsForDetail ?? '') : WAITS_FOR_WORDS[waitsFor];
    return { state: 'locked_out', headline: AS_LEFT_HEADLINES.lockedOut(until), reason, waitsFor };
  }
  const rts = visit.returnToService;
  if (!rts) return null;
  return {
    state: 'returned_to_production',
    headline: AS_LEFT_HEADLINES.returned_to_production,
    checks: returnedChecks(rts),
    stoppingTimeMs: rts.stoppingTimeMs ?? null,
    distances: returnToServiceDistances(rts).map(distanceLine),
  };
}

// NOTICE messages are about damage to equipment (ANSI Z535), not the safety of people: not listed.
type PersonalMessage = SafetyMessage & { signalWord: VisitRecord['safety'][number]['signalWord'] };
const personalSafety = (m: SafetyMessage | undefined): PersonalMessage | null => (m && m.signalWord !== 'NOTICE' ? { ...m, signalWord: m.signalWord } : null);

function safetyOf(onPath: Step[]): VisitRecord['safety'] {
  const byText = new Map<string, VisitRecord['safety'][number]>();
  for (const step of onPath) {
    for (const message of [step.safety, ...(step.cautions ?? [])].map(personalSafety)) {
      // The return-to-service warning is listed once, last, under "Return to service" (below).
      if (!message || message.text === RETURN_TO_SERVICE.text) continue;
      const known = byText.get(message.text);
      if (known) known.appliedAt.push(step.title);
      else byText.set(message.text, { signalWord: message.signalWord, text: message.text, appliedAt: [step.title] });
    }
  }
  const rts = personalSafety(RETURN_TO_SERVICE)!;
  byText.set(rts.text, { signalWord: rts.signalWord, text: rts.text, appliedAt: ['Return to service'] });
  return [...byText.values()];
}

const minutesBetween = (from: string | null, to: string | null) => (from && to ? (Date.parse(to) - Date.parse(from)) / 60_000 : null);

/** The one visit record every rendering shows, from what the server read. Pure: same source, same record. */
export function buildVisitRecord(src: VisitRecordSource): VisitRecord {
  const { visit, procedure } = src;
  const steps = new Map(procedure.definition.steps.map((s) => [s.id, s]));
  const stepTitles = new Map(procedure.definition.steps.map((s) => [s.id, s.title]));
  const currentResults = src.results.filter((r) => r.supersededAt === null);
  const resultByStep = new Map(currentResults.map((r) => [r.stepId, r]));
  const traversal = traverseProcedure(
    procedure.definition,
    currentResults.filter((r) => r.outcome !== null).map((r) => ({ stepId: r.stepId, outcome: r.outcome! })),
  );
  const finding = traversal.findings[0] ?? null;
  const onPath = new Set(traversal.path.map((p) => p.stepId));
  const current = src.readings.filter((r) => r.supersededAt === null);
  const reference = visitReference(visit.id);
  const corrected = (src.issue?.number ?? 1) > 1;
  const asLeft = asLeftOf(visit);

  const pathSteps: RecordPathStep[] = traversal.path.map((p) => {
    const step = steps.get(p.stepId)!;
    const result = resultByStep.get(p.stepId);
    const outcome = 'outcomes' in step ? step.outcomes.find((o) => o.value === p.outcome) : undefined;
    const inputs = result?.inputs ?? {};
    const gate = step.kind === 'safety_gate';
    return {
      stepId: p.stepId,
      title: step.title,
      kind: step.kind,
      answer: outcome?.label ?? p.outcome,
      confirmations: gate ? step.confirmations : [],
      confirmedAt: result?.confirmedAt ?? null,
      confirmedBy: gate && result?.confirmedAt ? (src.people[result.createdBy] ?? null) : null,
      details: (step.inputs ?? []).filter((i) => inputs[i.key]).map((i) => `${i.label}: ${String(inputs[i.key])}`),
      note: result?.note ?? null,
    };
  });

  return {
    timeZone: src.timeZone,
    companyName: src.companyName,
    header: {
      visitId: visit.id,
      reference,
      status: visit.status,
      statusLabel: VISIT_STATUS_LABELS[visit.status],
      cancellation: visit.cancellation,
      customer: src.customer,
      site: src.site,
      siteLine: [src.site.name, src.site.address, src.site.city].filter(Boolean).join(', '),
      press: src.press,
      pressLine: pressLine(src.press),
      technician: { name: src.technicianName },
      startedAt: visit.startedAt,
      closedAt: visit.closedAt,
      faultDisplayed: visit.faultDisplayed,
      procedure: { title: procedure.title, version: procedure.version },
      bandSet: src.bandSet
        ? { label: src.bandSet.label, generation: src.bandSet.generation, version: src.bandSet.version, referenceTemperatureC: src.bandSet.bands.referenceTemperatureC, invented: src.bandSet.bands.invented }
        : null,
      bandSetLine: src.bandSet ? `${src.bandSet.label}, version ${src.bandSet.version}${src.bandSet.bands.invented ? ' (invented demo values)' : ''}` : 'None chosen',
    },
    issue: src.issue ? { number: src.issue.number, corrected, issuedAt: src.issue.issuedAt, expiresAt: src.issue.expiresAt } : null,
    title: reportTitle(reference, corrected),
    path: {
      steps: pathSteps,
      finding: finding && finding.kind === 'finding' ? { title: finding.title, conclusion: finding.conclusion, recommendedAction: finding.recommendedAction, escalate: finding.escalate } : null,
      noLongerApply: traversal.unusedAnswers.length,
    },
    // Readings of steps on the path taken; answers left behind by a changed branch are not part of the record.
    readings: { items: current.filter((r) => onPath.has(r.stepId)).map((r) => readingOf(src, stepTitles, r)), replaced: src.readings.length - current.length },
    work: {
      cause: { category: visit.causeCategory, label: visit.causeCategory ? CAUSE_LABELS[visit.causeCategory] : RECORD_WORDS.noCause },
      actionsTaken: visit.actionsTaken,
      recommendations: visit.recommendations,
      firmware: { controlFound: visit.controlFirmwareFound, controlLeft: visit.controlFirmwareLeft, monitorFound: visit.monitorFirmwareFound, monitorLeft: visit.monitorFirmwareLeft },
    },
    parts: src.parts,
    // A press left locked out was not repaired: no time to repair (the figures leave it out too).
    times: { labourMinutes: visit.labourMinutes, travelMinutes: visit.travelMinutes, repairMinutes: asLeft?.state === 'locked_out' ? null : minutesBetween(visit.startedAt, visit.closedAt) },
    asLeft,
    safety: safetyOf([...traversal.path.map((p) => steps.get(p.stepId)!), ...(finding ? [finding] : [])]),
    photos: src.attachments
      .filter((a) => a.kind === 'photo')
      .map((a) => ({ id: a.id, caption: a.caption, stepTitle: a.stepId ? (stepTitles.get(a.stepId) ?? null) : null, hasThumb: a.hasThumb })),
    signOff: {
      contactName: visit.contactName,
      contactEmail: visit.contactEmail,
      signedAt: visit.signedAt,
      signatureId: src.attachments.filter((a) => a.kind === 'signature').at(-1)?.id ?? null,
      acknowledgement: src.issue?.acknowledgedAt ? { at: src.issue.acknowledgedAt, by: src.issue.acknowledgedBy } : null,
    },
  };
}
