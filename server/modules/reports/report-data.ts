import type { Transaction } from 'sequelize';
import { formatSi } from '../../../shared/domain/format-quantity';
import type { EntryJudgement, ResistanceFigures } from '../../../shared/domain/judge-entry';
import { RETURN_TO_SERVICE } from '../../../shared/data/safety-messages';
import type { BandSetValues } from '../../../shared/schemas/band-set';
import type { Step } from '../../../shared/schemas/procedure';
import { CIRCUIT_LEADS, type CauseCategory, type Circuit, type Verdict } from '../../../shared/schemas/reading';
import { CAUSE_LABELS, type ReturnToService } from '../../../shared/schemas/visit';
import { Attachment } from '../attachments/attachments.model';
import { visitReference } from '../visits/visit-access';
import { currentReadings, currentResults, loadVisitContext, type VisitContext } from '../visits/visit-context';
import { traverse } from '../visits/visit-state';
import { PartUsed, type Reading } from '../visits/visit-work.model';
import { visitIncludes } from '../visits/visits.service';
import { Visit } from '../visits/visits.model';
import type { ReportIssue } from './report-issues.model';
import type { ReportPathStep, ReportReading, ReportSafetyStatement, ReportView } from './report-view';

export const VERDICT_LABELS: Record<Verdict, string> = {
  in_band: 'In band',
  near_edge: 'Near edge',
  out_of_band: 'Out of band',
  open: 'Open circuit',
  short: 'Short circuit',
};

const CIRCUIT_NAMES: Record<Circuit, string> = { rotor: 'Rotor', stator_1: 'Sine stator', stator_2: 'Cosine stator' };
const POSITION_NAMES = { control_end: 'Control end', sensor_end: 'Sensor end' } as const;
const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

export const RETURN_TO_SERVICE_CHECKS: Record<'faultCleared' | 'tdcAgrees' | 'stoppingTimeChecked', string> = {
  faultCleared: 'The fault has cleared on the control.',
  tdcAgrees: 'The crank-angle display reads top dead centre with the slide at the top.',
  stoppingTimeChecked: 'The stopping-time / brake-monitor check passed.',
};

function returnToServiceChecks(rts: ReturnToService | null) {
  if (!rts) return null;
  const checks = (Object.keys(RETURN_TO_SERVICE_CHECKS) as (keyof typeof RETURN_TO_SERVICE_CHECKS)[]).filter((k) => rts[k]).map((k) => RETURN_TO_SERVICE_CHECKS[k]);
  checks.push(
    rts.presenceSensingDistanceOk === 'yes'
      ? 'Every presence-sensing device still sits at or beyond its safety distance for the measured stopping time.'
      : 'No presence-sensing device is fitted to this press.',
  );
  return { checks, stoppingTimeMs: rts.stoppingTimeMs ?? null };
}

function bandText(band: BandSetValues | null, r: Reading): string | null {
  if (!band) return null;
  if (r.quantity === 'resistance') {
    const w = band.windings[r.circuit];
    return `${formatSi(w.nominal, 'resistance')} ± ${w.inBandPercent} % at ${band.referenceTemperatureC} °C (near edge ± ${w.nearEdgePercent} %)`;
  }
  if (r.circuit === 'rotor') return `Excitation ${formatSi(band.excitation.min, 'ac_voltage')} to ${formatSi(band.excitation.max, 'ac_voltage')} RMS`;
  const m = band.statorOutputMagnitude;
  return `Stator pair √(S1² + S2²) ${formatSi(m.min, 'ac_voltage')} to ${formatSi(m.max, 'ac_voltage')} RMS`;
}

function readingView(ctx: VisitContext, stepTitles: Map<string, string>, r: Reading): ReportReading {
  const j = r.judgement as unknown as EntryJudgement;
  const figures = j.status === 'judged' && j.figures.kind === 'resistance' ? (j.figures as ResistanceFigures) : null;
  let temperature: string | null = null;
  if (r.windingTempC !== null && figures?.atReference != null) {
    temperature = `Winding at ${r.windingTempC} °C; corrected to ${figures.referenceTemperatureC} °C: ${formatSi(figures.atReference, 'resistance')}`;
  }
  let cable: string | null = null;
  if (figures?.cable && r.cable) {
    const run = `${r.cable.length} ${r.cable.lengthUnit} ${r.cable.lengthIs === 'loop' ? 'loop' : 'one way'}`;
    cable = `AWG ${r.cable.awg} cable, ${run}: ${formatSi(figures.cable.resistance, 'resistance')} subtracted (winding ${formatSi(figures.winding ?? 0, 'resistance')})`;
  } else if (r.cable) {
    cable = 'Taken at the sensor end: no cable allowance.';
  }
  return {
    id: r.id,
    stepTitle: stepTitles.get(r.stepId) ?? r.stepId,
    circuit: `${CIRCUIT_NAMES[r.circuit]} ${CIRCUIT_LEADS[r.circuit]}`,
    quantity: r.quantity,
    position: POSITION_NAMES[r.position],
    entered: r.entry,
    band: bandText(ctx.bandSet?.bands ?? null, r),
    verdict: r.verdict,
    verdictLabel: r.verdict ? VERDICT_LABELS[r.verdict] : 'Not judged',
    reason: r.reason,
    temperature,
    cable,
  };
}

function pathView(ctx: VisitContext, steps: Map<string, Step>): ReportPathStep[] {
  const results = new Map(currentResults(ctx).map((r) => [r.stepId, r]));
  return traverse(ctx).path.map((p) => {
    const step = steps.get(p.stepId)!;
    const result = results.get(p.stepId);
    const outcome = 'outcomes' in step ? step.outcomes.find((o) => o.value === p.outcome) : undefined;
    const inputs = (result?.answer.inputs ?? {}) as Record<string, string>;
    const details = (step.inputs ?? []).filter((i) => inputs[i.key]).map((i) => `${i.label}: ${inputs[i.key]}`);
    return {
      stepId: p.stepId,
      title: step.title,
      kind: step.kind,
      answer: outcome?.label ?? p.outcome,
      confirmations: step.kind === 'safety_gate' ? step.confirmations : [],
      confirmedAt: iso(result?.confirmedAt),
      details,
      note: result?.note ?? null,
    };
  });
}

function safetyView(steps: Step[]): ReportSafetyStatement[] {
  const byText = new Map<string, ReportSafetyStatement>();
  for (const step of steps) {
    if (!step.safety) continue;
    const known = byText.get(step.safety.text);
    if (known) known.appliedAt.push(step.title);
    else byText.set(step.safety.text, { signalWord: step.safety.signalWord, text: step.safety.text, appliedAt: [step.title] });
  }
  byText.set(RETURN_TO_SERVICE.text, { signalWord: RETURN_TO_SERVICE.signalWord, text: RETURN_TO_SERVICE.text, appliedAt: ['Return to service'] });
  return [...byText.values()];
}

/** Everything the report shows about one visit, read inside the caller's transaction when given. */
export async function buildReportView(
  visitId: number,
  options: { companyName: string; issue: ReportIssue | null; transaction?: Transaction; /** Already loaded with visitIncludes. */ visit?: Visit },
): Promise<ReportView> {
  const { transaction, issue } = options;
  const visit = options.visit ?? (await Visit.findByPk(visitId, { include: visitIncludes, transaction }))!;
  const ctx = await loadVisitContext(visit, transaction);
  // Sequential: inside the close transaction these share one connection.
  const parts = await PartUsed.findAll({ where: { visitId }, order: [['createdAt', 'ASC']], transaction });
  const attachments = await Attachment.findAll({ where: { visitId }, order: [['createdAt', 'ASC'], ['id', 'ASC']], transaction });
  const steps = new Map(ctx.definition.steps.map((s) => [s.id, s]));
  const stepTitles = new Map(ctx.definition.steps.map((s) => [s.id, s.title]));
  const traversal = traverse(ctx);
  const finding = traversal.findings[0] ?? null;
  const onPath = [...traversal.path.map((p) => steps.get(p.stepId)!), ...(finding ? [finding] : [])];
  const press = visit.press!;
  const site = press.site!;
  const signature = attachments.filter((a) => a.kind === 'signature').at(-1) ?? null;
  const current = currentReadings(ctx);
  const pathSteps = new Set(traversal.path.map((p) => p.stepId));

  return {
    companyName: options.companyName,
    reference: visitReference(visit.id),
    status: visit.status,
    issue: issue
      ? { number: issue.issueNumber, corrected: issue.issueNumber > 1, issuedAt: issue.createdAt.toISOString(), expiresAt: issue.expiresAt.toISOString() }
      : null,
    acknowledgement: issue?.acknowledgedAt ? { at: issue.acknowledgedAt.toISOString(), by: issue.acknowledgedBy } : null,
    customer: { name: site.customer!.name },
    site: { name: site.name, address: site.address, city: site.city },
    press: { assetTag: press.assetTag, model: press.model, tonnage: press.tonnage, controlModel: press.controlModel, sensorGeneration: press.sensorGeneration },
    technician: visit.technician?.name ?? '',
    startedAt: iso(visit.startedAt),
    closedAt: iso(visit.closedAt),
    faultDisplayed: visit.faultDisplayed,
    procedure: { title: ctx.procedure.title, version: ctx.procedure.version },
    bandSet: ctx.bandSet
      ? { label: ctx.bandSet.label, version: ctx.bandSet.version, referenceTemperatureC: ctx.bandSet.bands.referenceTemperatureC, invented: ctx.bandSet.bands.invented }
      : null,
    path: pathView(ctx, steps),
    finding: finding ? { title: finding.title, conclusion: finding.conclusion, recommendedAction: finding.recommendedAction, escalate: finding.escalate } : null,
    // Readings of steps on the path taken; answers left behind by a changed branch are not part of the report.
    readings: current.filter((r) => pathSteps.has(r.stepId)).map((r) => readingView(ctx, stepTitles, r)),
    replacedReadings: ctx.readings.length - current.length,
    firmware: { controlFound: visit.controlFirmwareFound, controlLeft: visit.controlFirmwareLeft, monitorFound: visit.monitorFirmwareFound, monitorLeft: visit.monitorFirmwareLeft },
    photos: attachments.filter((a) => a.kind === 'photo').map((a) => ({ id: a.id, caption: a.caption, stepTitle: a.stepId ? (stepTitles.get(a.stepId) ?? null) : null })),
    cause: { category: visit.causeCategory, label: visit.causeCategory ? CAUSE_LABELS[visit.causeCategory as CauseCategory] : 'Not recorded' },
    actionsTaken: visit.actionsTaken,
    recommendations: visit.recommendations,
    parts: parts.map((p) => ({ partNumber: p.partNumber, description: p.description, quantity: p.quantity, serialRemoved: p.serialRemoved, serialFitted: p.serialFitted })),
    labourMinutes: visit.labourMinutes,
    travelMinutes: visit.travelMinutes,
    returnToService: returnToServiceChecks(visit.returnToService),
    safety: safetyView(onPath),
    signature: { contactName: visit.contactName, signedAt: iso(visit.signedAt), attachmentId: signature?.id ?? null },
  };
}
