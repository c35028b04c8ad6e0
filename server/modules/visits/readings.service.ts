import type { Transaction } from 'sequelize';
import type { EntryJudgement } from '../../../shared/domain/judge-entry';
import { judgeMeasurements } from '../../../shared/domain/judge-measurements';
import { entryQuestion, parseEntry } from '../../../shared/domain/parse-entry';
import type { SessionUser } from '../../../shared/schemas/session';
import type { ReadingSaveInput } from '../../../shared/schemas/visit';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { loadWritableVisit } from './visit-access.service';
import { bandValues, currentReadings, findStep, loadVisitContext, type VisitContext } from './visit-context.service';
import { readingDto } from './visit-dto';
import { SavedMeanwhile, saveOnce } from './save-once';
import { assertReachable, toReadingInput } from './visit-state';
import { bumpVersion, staleVersion } from './visit-version';
import { Reading } from './visit-work.model';
import { detailById, getVisitDetail } from './visits.service';
import { Visit } from './visits.model';

function verdictFields(j: EntryJudgement | undefined): Pick<Reading, 'verdict' | 'reason' | 'judgement'> {
  if (!j) return { verdict: null, reason: 'Not judged yet: choose the sensor generation first.', judgement: { status: 'awaiting' } };
  if (j.status === 'judged') return { verdict: j.verdict, reason: j.reason, judgement: j as unknown as Record<string, unknown> };
  if (j.status === 'awaiting') return { verdict: null, reason: j.reason, judgement: j as unknown as Record<string, unknown> };
  return { verdict: null, reason: j.error, judgement: j as unknown as Record<string, unknown> };
}

/**
 * Judges every current reading of the visit again with the engine, step by step (a stator output
 * is judged with its partner), and stores the server's verdicts.
 */
export async function rejudgeVisitReadings(ctx: VisitContext, transaction: Transaction): Promise<void> {
  const band = bandValues(ctx);
  const byStep = new Map<string, Reading[]>();
  for (const r of currentReadings(ctx)) byStep.set(r.stepId, [...(byStep.get(r.stepId) ?? []), r]);
  for (const rows of byStep.values()) {
    const results = band ? judgeMeasurements(rows.map(toReadingInput), band).results : [];
    for (const [i, row] of rows.entries()) {
      await row.update({ ...verdictFields(results[i]?.judgement), bandSetId: ctx.bandSet?.id ?? null }, { transaction });
    }
  }
}

/**
 * Saves one reading typed at the press. The server parses and judges it itself; a retry with the
 * same id returns the stored reading; a new value for the same winding and place supersedes the old.
 */
export async function saveReading(user: SessionUser, visitId: number, input: ReadingSaveInput) {
  const stored = async () => {
    const existing = await Reading.findByPk(input.id);
    if (!existing) return null;
    if (existing.visitId !== visitId) throw new AppError(409, 'id_reused', 'That save id belongs to another reading. Reload the visit.');
    return { reading: readingDto(existing), visit: await getVisitDetail(user, visitId) };
  };
  return saveOnce(stored, () => storeReading(user, visitId, input));
}

async function storeReading(user: SessionUser, visitId: number, input: ReadingSaveInput) {
  const parsed = parseEntry(input.entered, input.quantity);
  if (!parsed.ok) throw new AppError(400, 'invalid_input', 'Some fields need attention.', { entered: parsed.error });
  const question = entryQuestion(input.entered, input.quantity);
  if (question && input.confirmed !== true) {
    throw new AppError(409, 'reading_unconfirmed', `Confirm this reading first: ${question.question}`, { entered: question.question });
  }
  return Visit.sequelize!.transaction(async (transaction) => {
    const visit = await loadWritableVisit(user, visitId, transaction);
    // A retry that waited for the row lock behind its first try finds that try's reading now.
    if (await Reading.findByPk(input.id, { transaction })) throw new SavedMeanwhile();
    const ctx = await loadVisitContext(visit, transaction);
    const step = findStep(ctx, input.stepId);
    assertReachable(ctx, input.stepId);
    if (step.kind !== 'measure') throw new AppError(400, 'invalid_input', `Step "${step.id}" takes no readings.`);
    const spec = step.readings.find((s) => s.quantity === input.quantity && s.circuit === input.circuit && s.position === input.position);
    if (!spec) throw new AppError(400, 'invalid_input', `Step "${step.id}" has no ${input.quantity} reading of ${input.circuit} at the ${input.position.replace('_', ' ')}.`);

    const previous = currentReadings(ctx).find((r) => r.stepId === input.stepId && r.quantity === input.quantity && r.circuit === input.circuit && r.position === input.position);
    // Another tab or device saved this winding meanwhile: show both values, never overwrite silently.
    if (input.replaces !== undefined && (previous?.id ?? null) !== input.replaces) {
      throw staleVersion(`${spec.label} was saved meanwhile, on another tab or device. Compare the two values and choose which one stands.`, {
        visit: await detailById(visitId, transaction),
        reading: previous ? readingDto(previous) : null,
      });
    }
    if (previous) await previous.update({ supersededAt: new Date() }, { transaction });
    const created = await Reading.create(
      {
        id: input.id,
        visitId,
        stepId: input.stepId,
        quantity: input.quantity,
        circuit: input.circuit,
        position: input.position,
        entered: input.entered,
        valueSi: parsed.kind === 'value' ? parsed.value : null,
        isOpen: parsed.kind === 'over_range',
        windingTemperatureC: input.windingTemperatureC ?? null,
        cable: input.cable ?? null,
        ...verdictFields(undefined),
        bandSetId: ctx.bandSet?.id ?? null,
        createdBy: user.id,
      },
      { transaction },
    );
    // rejudge updates `created` in place, so its verdict below is the stored one.
    ctx.readings.push(created);
    await rejudgeVisitReadings(ctx, transaction);
    await bumpVersion(visit, transaction);
    await audit({ visitId, actorId: user.id, action: previous ? 'reading_replaced' : 'reading_saved', detail: { stepId: input.stepId, circuit: input.circuit, position: input.position, entered: input.entered, verdict: created.verdict } }, transaction);
    return { reading: readingDto(created), visit: await detailById(visitId, transaction) };
  });
}
