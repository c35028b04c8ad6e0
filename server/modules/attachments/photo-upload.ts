import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import type { Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { AppError } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { MAX_PHOTOS_PER_UPLOAD } from './attachments.schema';
import { tooLarge, type IncomingPhoto } from './attachments.service';

export const PHOTO_FIELD = 'photos';
/** Uploads one person may have on their way at once; a tablet's outbox sends one at a time. */
export const MAX_UPLOADS_PER_USER = 3;
/** Room for the form's text fields and multipart framing beside the photos themselves. */
const FORM_OVERHEAD_BYTES = 256 * 1024;
/** Temp folders older than this are left over from a process that stopped mid-upload. */
const STALE_TEMP_MS = 60 * 60 * 1000;

/** Multer's refusals, as answers that say what to do next. */
function uploadError(err: unknown, maxBytes: number): AppError {
  if (err instanceof multer.MulterError) {
    switch (err.code) {
      case 'LIMIT_FILE_SIZE':
        return tooLarge(maxBytes);
      case 'LIMIT_FILE_COUNT':
        return tooManyPhotos();
      case 'LIMIT_UNEXPECTED_FILE':
        return err.field === PHOTO_FIELD
          ? tooManyPhotos()
          : new AppError(400, 'unexpected_file_field', `A file arrived in the field "${err.field ?? ''}"; send photos in the field "${PHOTO_FIELD}".`);
      default:
        return new AppError(400, 'bad_upload_form', `The upload form was refused (${err.message.toLowerCase()}). Send only photos, stepId, caption or captions, and id or ids.`);
    }
  }
  logger.warn({ err }, 'multipart body could not be read');
  return new AppError(400, 'bad_upload_form', 'The upload arrived incomplete or malformed. Check the connection and send it again.');
}

const tooManyPhotos = () =>
  new AppError(400, 'too_many_files', `At most ${MAX_PHOTOS_PER_UPLOAD} photos go in one upload. Send the rest in a second upload.`);

/**
 * Answers a refusal without reading the rest of the body: `Connection: close` makes Node close the
 * socket once the answer is written, instead of reading and discarding what the client still sends.
 */
function refuseUnread(res: Response, next: (err: unknown) => void, err: unknown): void {
  res.setHeader('Connection', 'close');
  next(err);
}

export interface PhotoUploadOptions {
  maxBytes: number;
  /** Where bodies are streamed while they arrive: a folder of the upload root, emptied per request. */
  tempRoot: string;
  /**
   * Runs before a byte of the body is read: the caller's access to the visit (404 for another
   * technician's visit, 409 for a closed one), so a refused upload is never received.
   */
  checkAccess: (req: Request) => Promise<void>;
}

const TEMP_DIR = Symbol('photoUploadTempDir');
type WithTemp = Request & { [TEMP_DIR]?: string };

/** Removes leftovers of a process that stopped while bodies were arriving. */
function sweepStaleTemp(tempRoot: string): void {
  let names: string[];
  try {
    names = fs.readdirSync(tempRoot);
  } catch {
    return;
  }
  for (const name of names) {
    const full = path.join(tempRoot, name);
    try {
      if (Date.now() - fs.statSync(full).mtimeMs > STALE_TEMP_MS) fs.rmSync(full, { recursive: true, force: true });
    } catch (err) {
      logger.warn({ err, full }, 'could not remove a stale upload temp folder');
    }
  }
}

/** Removes the request's temp folder and everything in it; safe to call more than once. */
export async function discardUploadedPhotos(req: Request): Promise<void> {
  const dir = (req as WithTemp)[TEMP_DIR];
  if (!dir) return;
  (req as WithTemp)[TEMP_DIR] = undefined;
  try {
    await fs.promises.rm(dir, { recursive: true, force: true });
  } catch (err) {
    logger.error({ err, dir }, 'could not remove an upload temp folder');
  }
}

/** The photos multer wrote for this request, as the service takes them. */
export function uploadedPhotos(req: Request): IncomingPhoto[] {
  return ((req.files as Express.Multer.File[] | undefined) ?? []).map((f) => ({ path: f.path, size: f.size, originalName: f.originalname }));
}

/**
 * A multipart photo upload, in this order: the declared length against the limits, the uploads
 * this person already has on the way, the caller's access to the visit, and only then the body,
 * streamed to a temp file per photo (each at most maxBytes). The route removes the temp files with
 * discardUploadedPhotos when it has answered; a refusal here removes them itself.
 */
export function photoUpload({ maxBytes, tempRoot, checkAccess }: PhotoUploadOptions): RequestHandler {
  fs.mkdirSync(tempRoot, { recursive: true });
  sweepStaleTemp(tempRoot);
  const inFlight = new Map<number, number>();
  const maxBody = MAX_PHOTOS_PER_UPLOAD * maxBytes + FORM_OVERHEAD_BYTES;

  const upload = multer({
    storage: multer.diskStorage({
      destination: (req, _file, cb) => {
        const r = req as WithTemp;
        if (!r[TEMP_DIR]) r[TEMP_DIR] = path.join(tempRoot, randomUUID());
        fs.mkdir(r[TEMP_DIR], { recursive: true, mode: 0o700 }, (err) => cb(err, r[TEMP_DIR]!));
      },
      filename: (_req, _file, cb) => cb(null, randomUUID()),
    }),
    limits: { fileSize: maxBytes, files: MAX_PHOTOS_PER_UPLOAD, fields: 10, fieldSize: 16 * 1024, parts: MAX_PHOTOS_PER_UPLOAD + 10 },
  }).array(PHOTO_FIELD, MAX_PHOTOS_PER_UPLOAD);

  return (req, res, next) => {
    const declared = Number(req.headers['content-length']);
    if (Number.isFinite(declared) && declared > maxBody) return refuseUnread(res, next, tooLarge(maxBytes));

    const userId = req.user!.id;
    const busy = inFlight.get(userId) ?? 0;
    if (busy >= MAX_UPLOADS_PER_USER) {
      return refuseUnread(
        res,
        next,
        new AppError(429, 'uploads_busy', `${busy} of your uploads are still on their way. Wait until one has finished, then send this one again.`),
      );
    }
    inFlight.set(userId, busy + 1);
    let released = false;
    const release = () => {
      if (released) return;
      released = true;
      const left = (inFlight.get(userId) ?? 1) - 1;
      if (left > 0) inFlight.set(userId, left);
      else inFlight.delete(userId);
      // A safety net: the route removes the temp files before answering; this covers an aborted request.
      void discardUploadedPhotos(req);
    };
    res.once('close', release);

    checkAccess(req).then(
      () =>
        upload(req, res, (err?: unknown) => {
          if (err === undefined) return next();
          void discardUploadedPhotos(req).then(() => next(uploadError(err, maxBytes)));
        }),
      (err: unknown) => refuseUnread(res, next, err),
    );
  };
}
