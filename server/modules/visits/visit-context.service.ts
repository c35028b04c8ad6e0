import { Op, type Transaction } from 'sequelize';
import type { BandSetValues } from '../../../shared/schemas/band-set';
import type { FirmwareRule } from '../../../shared/schemas/firmware-rule';
import type { ProcedureDefinition, Step } from '../../../shared/schemas/procedure';
import { AppError } from '../../lib/errors';
import { BandSetVersion, FirmwareRuleSet, ProcedureVersion } from '../reference/reference.model';
import { Reading, StepResult } from './visit-work.model';
import type { Visit } from './visits.model';

/** Everything the engine needs to judge one visit: its pinned versions and what was recorded. */
export interface VisitContext {
  visit: Visit;
  procedure: ProcedureVersion;
  definition: ProcedureDefinition;
  bandSet: BandSetVersion | null;
  rules: FirmwareRule[];
  results: StepResult[];
  readings: Reading[];
}

export async function loadVisitContext(visit: Visit, transaction?: Transaction): Promise<VisitContext> {
  const procedure = visit.procedureId ? await ProcedureVersion.findByPk(visit.procedureId, { transaction }) : null;
  if (!procedure) throw new AppError(500, 'visit_without_procedure', 'This visit has no procedure pinned.');
  // One after another: inside a transaction they share one connection, which runs one query at a time.
  const bandSet = visit.bandSetId ? await BandSetVersion.findByPk(visit.bandSetId, { transaction }) : null;
  const ruleSet = visit.firmwareRuleSetId ? await FirmwareRuleSet.findByPk(visit.firmwareRuleSetId, { transaction }) : null;
  const results = await StepResult.findAll({ where: { visitId: visit.id }, order: [['createdAt', 'ASC']], transaction });
  const readings = await Reading.findAll({ where: { visitId: visit.id }, order: [['createdAt', 'ASC']], transaction });
  return { visit, procedure, definition: procedure.definition, bandSet, rules: ruleSet?.rules ?? [], results, readings };
}

export function findStep(ctx: VisitContext, stepId: string): Step {
  const step = ctx.definition.steps.find((s) => s.id === stepId);
  if (!step) throw new AppError(404, 'not_found', `Step "${stepId}" is not part of ${ctx.procedure.title} v${ctx.procedure.version}.`);
  return step;
}

export const currentResults = (ctx: VisitContext) => ctx.results.filter((r) => r.supersededAt === null);
export const currentReadings = (ctx: VisitContext) => ctx.readings.filter((r) => r.supersededAt === null);
export const bandValues = (ctx: VisitContext): BandSetValues | null => ctx.bandSet?.bands ?? null;

/** The latest published band set of a generation: what a visit pins when the generation becomes known. */
export function latestPublishedBandSet(generation: string, transaction?: Transaction): Promise<BandSetVersion | null> {
  return BandSetVersion.findOne({ where: { generation, publishedAt: { [Op.ne]: null } }, order: [['version', 'DESC']], transaction });
}
