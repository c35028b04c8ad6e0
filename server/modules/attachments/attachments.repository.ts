import { Op, type CreationAttributes, type Transaction, type WhereOptions } from 'sequelize';
import { Attachment } from './attachments.model';
import type { AttachmentListQuery } from './attachments.schema';

export type NewAttachment = CreationAttributes<Attachment>;

export function listAttachments(visitId: number, q: AttachmentListQuery = {}) {
  const where: WhereOptions<Attachment> = { visitId };
  if (q.kind) where.kind = q.kind;
  if (q.stepId) where.stepId = q.stepId;
  return Attachment.findAll({ where, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
}

export const findAttachment = (visitId: number, id: string) => Attachment.findOne({ where: { id, visitId } });

export const findAttachmentsByIds = (ids: string[]) => (ids.length ? Attachment.findAll({ where: { id: { [Op.in]: ids } } }) : Promise.resolve([]));

/** One INSERT for all rows: they are stored together or not at all. */
export const insertAttachments = (rows: NewAttachment[], transaction?: Transaction) => Attachment.bulkCreate(rows, { transaction });

export const deleteAttachment = (attachment: Attachment) => attachment.destroy();
