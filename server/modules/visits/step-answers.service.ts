import type { Transaction } from 'sequelize';
import { evaluateFirmware } from '../../../shared/domain/firmware-compatibility';
import { judgeMeasurements, outcomeForStep } from '../../../shared/domain/judge-measurements';
import { FIRMWARE_UNREADABLE, FIRMWARE_VERSION_HINT, isFirmwareVersionAnswer } from '../../../shared/schemas/firmware-version';
import type { Step } from '../../../shared/schemas/procedure';
import type { SessionUser } from '../../../shared/schemas/session';
import type { StepAnswerInput } from '../../../shared/schemas/visit';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { loadWritableVisit } from './visit-access.service';
import { bandValues, findStep, latestPublishedBandSet, loadVisitContext, type VisitContext } from './visit-context.service';
import { assertReachable, missingReadings, stepReadings, toReadingInput } from './visit-state';
import { SavedMeanwhile, saveOnce } from './save-once';
import { StepResult } from './visit-work.model';
import { rejudgeVisitReadings } from './readings.service';
import { stepResultDto } from './visit-dto';
import { bumpVersion, staleVersion } from './visit-version';
import { detailById, getVisitDetail } from './visits.service';
import { Visit } from './visits.model';

const invalid = (field: string, message: string) => new AppError(400, 'invalid_input', 'Some fields need attention.', { [field]: message });

async function pinGeneration(ctx: VisitContext, generation: string, transaction: Transaction): Promise<void> {
  // A visit keeps the band-set version it started judging with; only a different generation re-pins.
  if (ctx.bandSet?.generation === generation) return;
  const bandSet = await latestPublishedBandSet(generation, transaction);
  if (!bandSet) throw invalid('inputs.sensor_generation', `No published band set for generation "${generation}". Pick one from the list.`);
  if (ctx.visit.bandSetId === bandSet.id) return;
  await ctx.visit.update({ bandSetId: bandSet.id }, { transaction });
  ctx.bandSet = bandSet;
  await rejudgeVisitReadings(ctx, transaction);
}

/** Works out the outcome the server stands behind for one step, from the answer and the record. */
async function decideOutcome(ctx: VisitContext, step: Step, input: StepAnswerInput, transaction: Transaction): Promise<{ outcome: string; confirmedAt: Date | null; detail: Record<string, unknown> }> {
  const inputs = input.inputs ?? {};
  const declared = step.inputs ?? [];
  const unknown = Object.keys(inputs).filter((key) => !declared.some((spec) => spec.key === key));
  if (unknown.length > 0) {
    const takes = declared.length ? `It takes ${declared.map((spec) => spec.key).join(', ')}.` : 'It takes no inputs.';
    throw new AppError(400, 'invalid_input', `Step "${step.id}" has no input named ${unknown.map((key) => `"${key}"`).join(', ')}. ${takes}`, Object.fromEntries(unknown.map((key) => [`inputs.${key}`, 'This step has no such input'])));
  }
  for (const spec of declared) {
    const value = inputs[spec.key];
    if (spec.required && !value) throw invalid(`inputs.${spec.key}`, `${spec.label} is required.`);
    if (value && spec.type === 'version' && !isFirmwareVersionAnswer(value)) throw invalid(`inputs.${spec.key}`, `${spec.label}: ${FIRMWARE_VERSION_HINT}`);
    if (value && spec.type === 'yes_no' && !['yes', 'no'].includes(value)) throw invalid(`inputs.${spec.key}`, `${spec.label}: answer yes or no.`);
  }
  if (inputs.sensor_generation) await pinGeneration(ctx, inputs.sensor_generation, transaction);

  switch (step.kind) {
    case 'finding':
      throw new AppError(400, 'invalid_input', 'A finding is where the procedure ends; there is nothing to answer. Go on to close-out.');
    case 'safety_gate':
      if (input.confirmed !== true) {
        throw invalid('confirmed', 'Confirm every point of this safety step before going on. It cannot be skipped.');
      }
      return { outcome: 'confirmed', confirmedAt: new Date(), detail: { confirmations: step.confirmations } };
    case 'firmware': {
      const pc = inputs.press_control_version;
      const mm = inputs.monitor_module_version;
      if (!pc || !mm) throw invalid('inputs', 'Type both firmware versions.');
      const evaluation = evaluateFirmware(pc, mm, ctx.rules);
      // The visit's "as found" versions stay empty for a display nobody could read; the answer records why.
      const readable = (v: string) => (v === FIRMWARE_UNREADABLE ? null : v);
      await ctx.visit.update(
        { controlFirmwareFound: ctx.visit.controlFirmwareFound ?? readable(pc), monitorFirmwareFound: ctx.visit.monitorFirmwareFound ?? readable(mm) },
        { transaction },
      );
      return { outcome: evaluation.outcome, confirmedAt: null, detail: { reason: evaluation.reason, matchedRules: evaluation.matchedRules.map((r) => r.key) } };
    }
    case 'measure': {
      const band = bandValues(ctx);
      if (!band) {
        throw new AppError(409, 'generation_unknown', 'Choose the sensor generation (or accept the suggested one) so the readings can be judged.');
      }
      const missing = missingReadings(ctx, step);
      if (missing.length) throw new AppError(409, 'readings_missing', `Enter every reading of this step first. Missing: ${missing.join('; ')}.`);
      // A meter that cannot follow the excitation frequency reads low; then only the ratio is judged.
      const ratioOnly = inputs.meter_covers_frequency === 'no';
      const judged = judgeMeasurements(stepReadings(ctx, step.id).map(toReadingInput), band, { ratioOnly });
      const outcome = outcomeForStep(judged, step.outcomes.map((o) => o.value));
      if (!outcome) throw new AppError(409, 'readings_unreadable', `Some readings cannot be judged yet: ${judged.reason}`);
      return { outcome, confirmedAt: null, detail: { reason: judged.reason, ...(inputs.meter_covers_frequency ? { meterCoversFrequency: inputs.meter_covers_frequency } : {}) } };
    }
    default: {
      const allowed = step.outcomes.map((o) => o.value);
      if (!input.outcome || !allowed.includes(input.outcome)) {
        throw invalid('outcome', `Choose one of: ${step.outcomes.map((o) => o.label).join(' / ')}.`);
      }
      return { outcome: input.outcome, confirmedAt: null, detail: {} };
    }
  }
}

/**
 * Records an answer at one step. Idempotent on the client's UUID. A different answer to a step
 * already answered supersedes the old one (kept as history), and the branching is re-run.
 */
export async function answerStep(user: SessionUser, visitId: number, stepId: string, input: StepAnswerInput) {
  const stored = async () => {
    const existing = await StepResult.findByPk(input.id);
    if (!existing) return null;
    if (existing.visitId !== visitId || existing.stepId !== stepId) throw new AppError(409, 'id_reused', 'That save id belongs to another answer. Reload the visit.');
    // A retry gets its stored answer back, even after the visit has closed.
    return getVisitDetail(user, visitId);
  };
  return saveOnce(stored, () => storeAnswer(user, visitId, stepId, input));
}

async function storeAnswer(user: SessionUser, visitId: number, stepId: string, input: StepAnswerInput) {
  return Visit.sequelize!.transaction(async (transaction) => {
    const visit = await loadWritableVisit(user, visitId, transaction);
    // A retry that waited for the row lock behind its first try finds that try's answer now.
    if (await StepResult.findByPk(input.id, { transaction })) throw new SavedMeanwhile();
    const ctx = await loadVisitContext(visit, transaction);
    const step = findStep(ctx, stepId);
    assertReachable(ctx, stepId);
    const previous = ctx.results.find((r) => r.stepId === stepId && r.supersededAt === null);
    // Another tab or device answered this step since the person looked: show them, never overwrite.
    if (input.replaces !== undefined && (previous?.id ?? null) !== input.replaces) {
      throw staleVersion(`"${step.title}" was answered meanwhile, on another tab or device. Compare the two answers and choose which one stands.`, {
        visit: await detailById(visitId, transaction),
        stepResult: previous ? stepResultDto(previous) : null,
      });
    }
    const decided = await decideOutcome(ctx, step, input, transaction);
    if (previous) {
      await previous.update({ supersededAt: new Date(), supersededReason: `Answer changed by ${user.name}` }, { transaction });
    }
    await StepResult.create(
      {
        id: input.id,
        visitId,
        stepId,
        outcome: decided.outcome,
        answer: { ...(input.inputs ? { inputs: input.inputs } : {}), ...decided.detail },
        note: input.note ?? null,
        confirmedAt: decided.confirmedAt,
        createdBy: user.id,
      },
      { transaction },
    );
    await audit(
      {
        visitId,
        actorId: user.id,
        action: step.kind === 'safety_gate' ? 'safety_gate_confirmed' : previous ? 'step_answer_changed' : 'step_answered',
        detail: { stepId, outcome: decided.outcome, previousOutcome: previous?.outcome ?? null },
      },
      transaction,
    );
    await bumpVersion(visit, transaction);
    return detailById(visitId, transaction);
  });
}
