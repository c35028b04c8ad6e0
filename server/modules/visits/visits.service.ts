import { Op, type Transaction, type WhereOptions } from 'sequelize';
import type { Page } from '../../../shared/schemas/common';
import type { SessionUser } from '../../../shared/schemas/session';
import type { VisitCreateInput, VisitListQuery } from '../../../shared/schemas/visit';
import { AppError } from '../../lib/errors';
import { toPage } from '../../lib/paging';
import { audit } from '../audit/audit';
import { Customer } from '../customers/customers.model';
import { Press } from '../presses/presses.model';
import { BandSetVersion, FirmwareRuleSet, ProcedureVersion } from '../reference/reference.model';
import { Site } from '../sites/sites.model';
import { User } from '../users/users.model';
import { loadAccessibleVisit } from './visit-access.service';
import { latestPublishedBandSet, loadVisitContext } from './visit-context.service';
import { visitDetail, visitSummary, type VisitDetailDto } from './visit-dto';

// The reports module builds the visit record from the same reading rows and shape.
export { readingDto } from './visit-dto';
import { traverse } from './visit-state';
import { PartUsed } from './visit-work.model';
import { Visit } from './visits.model';

export const visitIncludes = [
  { model: Press, as: 'press', include: [{ model: Site, as: 'site', include: [{ model: Customer, as: 'customer' }] }] },
  { model: User, as: 'technician', attributes: ['id', 'name'] },
];

const sequelizeOf = () => Visit.sequelize!;

/**
 * Opens a visit on a press for the signed-in person and starts it: pins the newest published
 * procedure, the band set of the press's sensor generation (when known) and the firmware rules.
 */
export async function createVisit(user: SessionUser, input: VisitCreateInput) {
  const press = await Press.findByPk(input.pressId);
  if (!press) throw new AppError(400, 'invalid_input', 'Some fields need attention.', { pressId: 'That press does not exist. Search for it again.' });
  const procedure = await ProcedureVersion.findOne({ where: { key: input.procedureKey, publishedAt: { [Op.ne]: null } }, order: [['version', 'DESC']] });
  if (!procedure) throw new AppError(400, 'invalid_input', 'Some fields need attention.', { procedureKey: 'No published procedure has that key.' });
  const ruleSet = await FirmwareRuleSet.findOne({ where: { publishedAt: { [Op.ne]: null } }, order: [['version', 'DESC']] });
  const bandSet = press.sensorGeneration ? await latestPublishedBandSet(press.sensorGeneration) : null;
  const now = new Date();

  const visit = await sequelizeOf().transaction(async (transaction) => {
    const created = await Visit.create(
      {
        pressId: press.id,
        technicianId: user.id,
        faultDisplayed: input.faultDisplayed,
        controlFirmwareFound: input.controlFirmwareFound ?? press.controlFirmware,
        monitorFirmwareFound: input.monitorFirmwareFound ?? press.monitorFirmware,
        procedureId: procedure.id,
        bandSetId: bandSet?.id ?? null,
        firmwareRuleSetId: ruleSet?.id ?? null,
        startedAt: null,
        closedAt: null,
      },
      { transaction },
    );
    await created.update({ status: 'in_progress', startedAt: now }, { transaction });
    await audit(
      { visitId: created.id, actorId: user.id, action: 'visit_started', detail: { procedure: `${procedure.key} v${procedure.version}`, bandSet: bandSet ? `${bandSet.generation} v${bandSet.version}` : null } },
      transaction,
    );
    return created;
  });
  return getVisitDetail(user, visit.id);
}

export async function listVisits(user: SessionUser, q: VisitListQuery): Promise<Page<ReturnType<typeof visitSummary>>> {
  const where: WhereOptions<Visit> = {};
  if (user.role === 'technician' || q.mine) Object.assign(where, { technicianId: user.id });
  if (q.status) Object.assign(where, { status: q.status });
  const { rows, count } = await Visit.findAndCountAll({
    where,
    include: visitIncludes,
    order: [['updatedAt', 'DESC'], ['id', 'DESC']],
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
    distinct: true,
  });
  return toPage(rows.map(visitSummary), count, { q: undefined, page: q.page, pageSize: q.pageSize });
}

export async function getVisitDetail(user: SessionUser, visitId: number): Promise<VisitDetailDto> {
  await loadAccessibleVisit(user, visitId);
  return detailById(visitId);
}

/** The record as it stands now, read inside the caller's transaction when given (access already checked). */
export async function detailById(visitId: number, transaction?: Transaction): Promise<VisitDetailDto> {
  const visit = (await Visit.findByPk(visitId, { include: visitIncludes, transaction }))!;
  return detailOf(visit, transaction);
}

export async function detailOf(visit: Visit, transaction?: Transaction): Promise<VisitDetailDto> {
  const ctx = await loadVisitContext(visit, transaction);
  // Sequential: a transaction's queries share one connection.
  const parts = await PartUsed.findAll({ where: { visitId: visit.id }, order: [['createdAt', 'ASC']], transaction });
  const publishedBandSets = await BandSetVersion.findAll({ where: { publishedAt: { [Op.ne]: null } }, order: [['generation', 'ASC'], ['version', 'DESC']], transaction });
  // Offer only the newest published version of each generation.
  const newest = publishedBandSets.filter((b, i, all) => all.findIndex((o) => o.generation === b.generation) === i);
  return visitDetail(ctx, traverse(ctx), { parts, publishedBandSets: newest });
}
