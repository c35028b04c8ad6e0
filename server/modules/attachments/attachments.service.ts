import { randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import { DatabaseError, UniqueConstraintError, type Transaction } from 'sequelize';
import type { SessionUser } from '../../../shared/schemas/session';
import { AppError } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { visitReference } from '../../../shared/format/visit-reference';
import { loadAccessibleVisit, loadWritableVisit } from '../visits/visit-access.service';
import { processImage, type ProcessedImage } from './image-processing';
import type { Attachment, AttachmentKind } from './attachments.model';
import { deleteAttachment, findAttachment, findAttachmentsByIds, insertAttachments, listAttachments, type NewAttachment } from './attachments.repository';
import { MAX_PHOTOS_PER_UPLOAD, type AttachmentDto, type AttachmentListQuery, type PhotoUploadFields } from './attachments.schema';
import type { FileStorage, StoredFile } from '../../lib/file-storage';

/** One photo of an upload: its bytes, or the temp file multer streamed them to. */
export type IncomingPhoto = (
  | { bytes: Buffer }
  | { path: string; size: number }
) & {
  /** The name the tablet gave the file: used in messages only, never for the type or the stored name. */
  originalName: string;
};

const sizeOf = (photo: IncomingPhoto) => ('bytes' in photo ? photo.bytes.length : photo.size);
/** Read one at a time while processing, so an upload never sits in memory whole. */
const bytesOf = (photo: IncomingPhoto) => ('bytes' in photo ? Promise.resolve(photo.bytes) : fs.readFile(photo.path));

export interface AttachmentServiceDeps {
  storage: FileStorage;
  /** The largest file accepted (UPLOAD_MAX_BYTES). */
  maxUploadBytes: number;
}

export function toAttachmentDto(a: Attachment): AttachmentDto {
  const base = `/api/visits/${a.visitId}/attachments/${a.id}`;
  return {
    id: a.id,
    visitId: a.visitId,
    kind: a.kind,
    stepId: a.stepId,
    caption: a.caption,
    mimeType: a.mimeType,
    bytes: a.bytes,
    width: a.width,
    height: a.height,
    url: `${base}/file`,
    thumbUrl: a.thumbKey ? `${base}/thumb` : null,
    createdBy: a.createdBy,
    createdAt: a.createdAt.toISOString(),
  };
}

function photoLabel(index: number, total: number, name: string): string {
  const shortName = name.length > 60 ? `${name.slice(0, 57)}…` : name;
  const which = total > 1 ? `Photo ${index + 1} of ${total}` : 'The photo';
  return shortName ? `${which} (${shortName})` : which;
}

/** The trigger on attachments refuses rows of a visit that was closed after we checked it. */
function isClosedVisitRefusal(err: unknown): boolean {
  if (!(err instanceof DatabaseError)) return false;
  const original = err.original as { code?: string; message?: string } | undefined;
  return original?.code === '23514' && /record cannot be changed/.test(original.message ?? '');
}

const closedMeanwhile = (visitId: number) =>
  new AppError(409, 'visit_not_open', `Visit ${visitReference(visitId)} was closed while the upload was on its way; nothing was stored. Reopen the visit to add photos.`);

/**
 * Photo uploads and signatures of a visit. Files go to FileStorage first and their rows are written
 * in one INSERT afterwards; when anything fails, every file written for the request is removed again.
 */
export function createAttachmentService({ storage, maxUploadBytes }: AttachmentServiceDeps) {
  async function removeFiles(keys: string[]): Promise<void> {
    for (const key of keys) {
      try {
        await storage.delete(key);
      } catch (err) {
        logger.error({ err, key }, 'could not remove an attachment file; it is left orphaned');
      }
    }
  }

  /**
   * Writes the files and rows of processed images together: all of them, or none. Inside a
   * transaction, the caller removes the files (the `written` list) when it does not commit.
   */
  async function storeAll(
    visitId: number,
    user: SessionUser,
    items: { id: string; kind: AttachmentKind; stepId: string | null; caption: string | null; image: ProcessedImage }[],
    transaction?: Transaction,
    written: string[] = [],
  ) {
    try {
      const rows: NewAttachment[] = [];
      // Rows of one INSERT would share a timestamp; a millisecond apart, a listing keeps the order they were sent in.
      const now = Date.now();
      for (const [i, { id, kind, stepId, caption, image }] of items.entries()) {
        const name = randomUUID();
        const storageKey = `visits/${visitId}/${name}.${image.extension}`;
        const thumbKey = `visits/${visitId}/${name}.thumb.jpg`;
        await storage.put(storageKey, image.data, image.mimeType);
        written.push(storageKey);
        await storage.put(thumbKey, image.thumb, 'image/jpeg');
        written.push(thumbKey);
        rows.push({ id, visitId, kind, stepId, caption, storageKey, thumbKey, mimeType: image.mimeType, bytes: image.data.length, width: image.width, height: image.height, createdBy: user.id, createdAt: new Date(now + i) });
      }
      return await insertAttachments(rows, transaction);
    } catch (err) {
      await removeFiles(written.splice(0));
      if (isClosedVisitRefusal(err)) throw closedMeanwhile(visitId);
      throw err;
    }
  }

  /** Pairs each file with its id and caption, as the fields describe. */
  function planPhotos(files: IncomingPhoto[], fields: PhotoUploadFields) {
    const count = files.length;
    if (fields.captions && fields.captions.length !== count) {
      throw new AppError(400, 'invalid_input', `captions lists ${fields.captions.length} caption(s) for ${count} photo(s); send one caption per photo, in the same order.`, {
        captions: 'One caption per photo, in the same order',
      });
    }
    const ids = fields.ids ?? (fields.id ? [fields.id] : undefined);
    if (ids && ids.length !== count) {
      throw new AppError(400, 'invalid_input', `ids lists ${ids.length} id(s) for ${count} photo(s); send one id per photo, in the same order.`, { ids: 'One id per photo, in the same order' });
    }
    if (ids && new Set(ids).size !== ids.length) {
      throw new AppError(400, 'invalid_input', 'The same id is given to two photos; give each photo its own id.', { ids: 'Each photo needs its own id' });
    }
    return files.map((file, i) => ({
      file,
      label: photoLabel(i, count, file.originalName),
      id: ids?.[i] ?? randomUUID(),
      caption: (fields.captions ? fields.captions[i] : fields.caption) || null,
    }));
  }

  /** Rows already stored under the request's ids (a retry); an id used elsewhere is a conflict. */
  async function alreadyStored(visitId: number, ids: string[]): Promise<Map<string, Attachment>> {
    const found = await findAttachmentsByIds(ids);
    for (const row of found) {
      if (row.visitId !== visitId || row.kind !== 'photo') {
        throw new AppError(409, 'id_in_use', `The id ${row.id} already belongs to another attachment; give the photo a new id and upload it again.`, { ids: 'This id is already used' });
      }
    }
    return new Map(found.map((row) => [row.id, row]));
  }

  return {
    /** The access an upload needs, checked before its body is read. */
    async checkUploadAccess(user: SessionUser, visitId: number): Promise<void> {
      await loadWritableVisit(user, visitId);
    },

    async list(user: SessionUser, visitId: number, q: AttachmentListQuery = {}): Promise<AttachmentDto[]> {
      await loadAccessibleVisit(user, visitId);
      return (await listAttachments(visitId, q)).map(toAttachmentDto);
    },

    /**
     * Stores the photos of one request, all or nothing. Answers `created: false` when every photo
     * was already stored by an earlier try with the same ids.
     */
    async uploadPhotos(user: SessionUser, visitId: number, files: IncomingPhoto[], fields: PhotoUploadFields): Promise<{ created: boolean; items: AttachmentDto[] }> {
      // Checked before the body was read (checkUploadAccess) and again now: the visit may have closed meanwhile.
      await loadWritableVisit(user, visitId);
      if (files.length === 0) {
        throw new AppError(400, 'no_file', `No photo arrived. Choose or take up to ${MAX_PHOTOS_PER_UPLOAD} photos and send them in the form field "photos".`);
      }
      const plan = planPhotos(files, fields);
      const existing = await alreadyStored(visitId, plan.map((p) => p.id));
      const fresh = plan.filter((p) => !existing.has(p.id));

      // Every photo is checked and re-encoded before the first one is stored.
      const processed = [];
      for (const p of fresh) {
        if (sizeOf(p.file) > maxUploadBytes) throw tooLarge(maxUploadBytes);
        try {
          processed.push({ id: p.id, kind: 'photo' as const, stepId: fields.stepId ?? null, caption: p.caption, image: await processImage(await bytesOf(p.file)) });
        } catch (err) {
          if (err instanceof AppError) throw new AppError(err.status, err.code, `${p.label} ${err.message} Nothing from this upload was stored.`);
          throw err;
        }
      }

      let created: Attachment[] = [];
      if (processed.length) {
        try {
          created = await storeAll(visitId, user, processed);
        } catch (err) {
          // Two tries of the same upload raced; the other one stored the rows, so answer with those.
          if (!(err instanceof UniqueConstraintError)) throw err;
          const now = await alreadyStored(visitId, plan.map((p) => p.id));
          if (now.size !== plan.length) {
            throw new AppError(409, 'upload_in_progress', 'Another try of this upload is being stored right now. Send it again in a moment; nothing is stored twice.');
          }
          for (const [id, row] of now) existing.set(id, row);
        }
      }
      const byId = new Map([...existing, ...created.map((row) => [row.id, row] as const)]);
      return { created: created.length > 0, items: plan.map((p) => toAttachmentDto(byId.get(p.id)!)) };
    },

    /**
     * Checks and re-encodes the customer's sign-off (PNG) before the close-out's transaction starts.
     * `store` writes it inside that transaction (kind 'signature'); `discard` removes its files
     * again when the transaction does not commit, so a refused close leaves no signature behind.
     */
    async prepareSignature(png: Buffer): Promise<PreparedSignature> {
      if (png.length === 0) throw new AppError(400, 'no_file', 'The signature is empty. Ask the customer to sign again.');
      if (png.length > maxUploadBytes) throw tooLarge(maxUploadBytes);
      let image: ProcessedImage;
      try {
        image = await processImage(png, { accept: ['image/png'] });
      } catch (err) {
        if (err instanceof AppError) throw new AppError(err.status, err.code, `The signature ${err.message}`);
        throw err;
      }
      const written: string[] = [];
      return {
        async store(user, visitId, transaction) {
          const [row] = await storeAll(visitId, user, [{ id: randomUUID(), kind: 'signature', stepId: null, caption: null, image }], transaction, written);
          return toAttachmentDto(row!);
        },
        discard: () => removeFiles(written.splice(0)),
      };
    },

    /** Stores a sign-off outside a close-out (its own statement). */
    async storeSignature(user: SessionUser, visitId: number, png: Buffer): Promise<AttachmentDto> {
      await loadWritableVisit(user, visitId);
      return (await this.prepareSignature(png)).store(user, visitId);
    },

    /** The stored picture (`file`) or its thumbnail (`thumb`), for streaming to the browser. */
    async openFile(user: SessionUser, visitId: number, id: string, variant: 'file' | 'thumb'): Promise<StoredFile & { mimeType: string; fileName: string }> {
      await loadAccessibleVisit(user, visitId);
      const row = await findAttachment(visitId, id);
      if (!row) throw new AppError(404, 'not_found', `Attachment ${id} was not found on visit ${visitReference(visitId)}.`);
      const key = variant === 'file' ? row.storageKey : row.thumbKey;
      if (!key) throw new AppError(404, 'not_found', 'This attachment has no thumbnail; open the full picture instead.');
      const file = await storage.get(key);
      if (!file) {
        logger.error({ attachmentId: id, key }, 'attachment row without its stored file');
        throw new AppError(404, 'file_missing', 'The picture file is missing from storage. Upload the photo again, and tell your administrator.');
      }
      const extension = variant === 'thumb' ? 'jpg' : key.slice(key.lastIndexOf('.') + 1);
      return { ...file, mimeType: variant === 'thumb' ? 'image/jpeg' : row.mimeType, fileName: `${row.kind}-${row.id}${variant === 'thumb' ? '-thumb' : ''}.${extension}` };
    },

    /** Removes a photo and its files while the visit is open; a signature is replaced by signing again. */
    async remove(user: SessionUser, visitId: number, id: string): Promise<void> {
      await loadWritableVisit(user, visitId);
      const row = await findAttachment(visitId, id);
      if (!row) throw new AppError(404, 'not_found', `Attachment ${id} was not found on visit ${visitReference(visitId)}.`);
      if (row.kind !== 'photo') throw new AppError(409, 'signature_kept', 'A signature cannot be deleted; the customer signs again at close-out.');
      try {
        await deleteAttachment(row);
      } catch (err) {
        if (isClosedVisitRefusal(err)) throw new AppError(409, 'visit_not_open', `Visit ${visitReference(visitId)} was closed meanwhile; its photos are part of the record now.`);
        throw err;
      }
      // The row goes first: a file left behind by a failed removal is only wasted space, never a broken link.
      await removeFiles([row.storageKey, ...(row.thumbKey ? [row.thumbKey] : [])]);
    },
  };
}

export interface PreparedSignature {
  store(user: SessionUser, visitId: number, transaction?: Transaction): Promise<AttachmentDto>;
  discard(): Promise<void>;
}

export type AttachmentService = ReturnType<typeof createAttachmentService>;

let configured: AttachmentService | undefined;

/** Makes one storage the process's attachment storage: the routes and storeSignature use it. */
export function configureAttachments(deps: AttachmentServiceDeps): AttachmentService {
  configured = createAttachmentService(deps);
  return configured;
}

function configuredService(): AttachmentService {
  if (!configured) throw new Error('attachment storage is not configured: createApp calls configureAttachments first');
  return configured;
}

/** Stores the customer's sign-off PNG on an open visit as a kind='signature' attachment. */
export function storeSignature(user: SessionUser, visitId: number, png: Buffer): Promise<AttachmentDto> {
  return configuredService().storeSignature(user, visitId, png);
}

/** Checks a sign-off PNG for the close-out, which stores it inside its own transaction. */
export function prepareSignature(png: Buffer): Promise<PreparedSignature> {
  return configuredService().prepareSignature(png);
}

export function tooLarge(maxBytes: number): AppError {
  const mb = (maxBytes / (1024 * 1024)).toFixed(maxBytes < 10 * 1024 * 1024 ? 1 : 0);
  return new AppError(413, 'file_too_large', `A photo is larger than ${mb} MB, the most one photo may be. Lower the camera resolution or crop the photo, and try again.`);
}
