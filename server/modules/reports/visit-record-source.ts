import type { Transaction } from 'sequelize';
import { buildVisitRecord, type VisitRecordSource } from '../../../shared/record/build-visit-record';
import type { VisitRecord } from '../../../shared/schemas/visit-record';
import { Attachment } from '../attachments/attachments.model';
import { User } from '../users/users.model';
import { loadVisitContext } from '../visits/visit-context.service';
import { PartUsed } from '../visits/visit-work.model';
import { readingDto, visitIncludes } from '../visits/visits.service';
import { Visit } from '../visits/visits.model';
import type { ReportIssue } from './report-issues.model';

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

export interface RecordOptions {
  companyName: string;
  timeZone: string;
  /** The report issue the record is for; the office's record passes the newest one. */
  issue: ReportIssue | null;
  transaction?: Transaction;
  /** Already loaded with visitIncludes. */
  visit?: Visit;
}

/** Reads one visit as plain values for the record builder, inside the caller's transaction when given. */
export async function readVisitRecordSource(visitId: number, options: RecordOptions): Promise<VisitRecordSource> {
  const { transaction, issue } = options;
  const visit = options.visit ?? (await Visit.findByPk(visitId, { include: visitIncludes, transaction }))!;
  const ctx = await loadVisitContext(visit, transaction);
  // Sequential: inside the close transaction these share one connection.
  const parts = await PartUsed.findAll({ where: { visitId }, order: [['createdAt', 'ASC']], transaction });
  const attachments = await Attachment.findAll({ where: { visitId }, order: [['createdAt', 'ASC'], ['id', 'ASC']], transaction });
  const peopleIds = [...new Set(ctx.results.map((r) => r.createdBy))];
  const people = peopleIds.length ? await User.findAll({ where: { id: peopleIds }, attributes: ['id', 'name'], transaction }) : [];
  const cancelledBy = visit.cancelledBy ? await User.findByPk(visit.cancelledBy, { attributes: ['id', 'name'], transaction }) : null;
  const press = visit.press!;
  const site = press.site!;
  return {
    companyName: options.companyName,
    timeZone: options.timeZone,
    visit: {
      id: visit.id,
      status: visit.status,
      faultDisplayed: visit.faultDisplayed,
      startedAt: iso(visit.startedAt),
      closedAt: iso(visit.closedAt),
      signedAt: iso(visit.signedAt),
      causeCategory: visit.causeCategory,
      actionsTaken: visit.actionsTaken,
      recommendations: visit.recommendations,
      labourMinutes: visit.labourMinutes,
      travelMinutes: visit.travelMinutes,
      asLeftState: visit.asLeftState,
      returnToService: visit.returnToService,
      lockedOut: visit.lockedOut,
      cancellation: visit.cancelledAt ? { at: visit.cancelledAt.toISOString(), by: cancelledBy?.name ?? null, reason: visit.cancelReason ?? '' } : null,
      contactName: visit.contactName,
      contactEmail: visit.contactEmail,
      controlFirmwareFound: visit.controlFirmwareFound,
      controlFirmwareLeft: visit.controlFirmwareLeft,
      monitorFirmwareFound: visit.monitorFirmwareFound,
      monitorFirmwareLeft: visit.monitorFirmwareLeft,
    },
    customer: { name: site.customer!.name },
    site: { name: site.name, address: site.address, city: site.city },
    press: { assetTag: press.assetTag, model: press.model, tonnage: press.tonnage, capacityUnit: site.customer!.capacityUnit, controlModel: press.controlModel, sensorGeneration: press.sensorGeneration },
    technicianName: visit.technician?.name ?? '',
    procedure: { title: ctx.procedure.title, version: ctx.procedure.version, definition: ctx.definition },
    bandSet: ctx.bandSet ? { label: ctx.bandSet.label, generation: ctx.bandSet.generation, version: ctx.bandSet.version, bands: ctx.bandSet.bands } : null,
    results: ctx.results.map((r) => ({
      stepId: r.stepId,
      outcome: r.outcome,
      inputs: ((r.answer as { inputs?: Record<string, unknown> }).inputs ?? {}),
      note: r.note,
      confirmedAt: iso(r.confirmedAt),
      createdBy: r.createdBy,
      supersededAt: iso(r.supersededAt),
    })),
    readings: ctx.readings.map(readingDto),
    parts: parts.map((p) => ({ id: p.id, partNumber: p.partNumber, description: p.description, quantity: p.quantity, serialRemoved: p.serialRemoved, serialFitted: p.serialFitted })),
    attachments: attachments.map((a) => ({ id: a.id, kind: a.kind, caption: a.caption, stepId: a.stepId, hasThumb: a.thumbKey !== null })),
    people: Object.fromEntries(people.map((u) => [u.id, u.name])),
    issue: issue
      ? { number: issue.issueNumber, issuedAt: issue.createdAt.toISOString(), expiresAt: issue.expiresAt.toISOString(), acknowledgedAt: iso(issue.acknowledgedAt), acknowledgedBy: issue.acknowledgedBy }
      : null,
  };
}

export async function readVisitRecord(visitId: number, options: RecordOptions): Promise<VisitRecord> {
  return buildVisitRecord(await readVisitRecordSource(visitId, options));
}
