import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { MAX_PHOTOS_PER_UPLOAD } from './attachments.schema';
import { tooLarge } from './attachments.service';

export const PHOTO_FIELD = 'photos';

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
 * Reads a multipart photo upload into memory (each file at most maxBytes): the bytes are checked
 * and re-encoded before anything is written, so a refused upload leaves nothing on disk.
 */
export function photoUpload(maxBytes: number): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: MAX_PHOTOS_PER_UPLOAD, fields: 10, fieldSize: 16 * 1024, parts: MAX_PHOTOS_PER_UPLOAD + 10 },
  }).array(PHOTO_FIELD, MAX_PHOTOS_PER_UPLOAD);
  return (req, res, next) => {
    upload(req, res, (err?: unknown) => next(err === undefined ? undefined : uploadError(err, maxBytes)));
  };
}
