import sharp from 'sharp';
import { AppError } from '../../lib/errors';

export const IMAGE_MIME_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type ImageMimeType = (typeof IMAGE_MIME_TYPES)[number];

export const THUMB_WIDTH = 320;
/** A 48-megapixel tablet camera fits; a small file that decodes to gigabytes of pixels does not. */
export const MAX_IMAGE_PIXELS = 80_000_000;

export interface ProcessedImage {
  mimeType: ImageMimeType;
  extension: 'jpg' | 'png' | 'webp';
  /** The picture re-encoded upright, with no EXIF, GPS, XMP, IPTC or comments left in it. */
  data: Buffer;
  width: number;
  height: number;
  /** A JPEG at most THUMB_WIDTH pixels wide, transparency laid on white. */
  thumb: Buffer;
}

type Sniffed =
  | { accepted: true; mimeType: ImageMimeType }
  | { accepted: false; kind: 'gif' | 'svg' | 'heic' | 'avif' | 'tiff' | 'bmp' | 'pdf' | 'unknown' };

const startsWith = (bytes: Buffer, signature: number[], at = 0) => signature.every((b, i) => bytes[at + i] === b);
const ascii = (bytes: Buffer, from: number, to: number) => bytes.subarray(from, to).toString('latin1');

/** What the bytes are, by their signature; the name and the declared type are never consulted. */
export function sniffImageType(bytes: Buffer): Sniffed {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return { accepted: true, mimeType: 'image/jpeg' };
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { accepted: true, mimeType: 'image/png' };
  if (ascii(bytes, 0, 4) === 'RIFF' && ascii(bytes, 8, 12) === 'WEBP') return { accepted: true, mimeType: 'image/webp' };
  if (ascii(bytes, 0, 4) === 'GIF8') return { accepted: false, kind: 'gif' };
  if (ascii(bytes, 4, 8) === 'ftyp') {
    // ISO base media file: the brands say whether it holds HEVC (HEIC) or AV1 (AVIF) pictures.
    const boxSize = Math.min(bytes.readUInt32BE(0), bytes.length, 64);
    const brands = ascii(bytes, 8, boxSize);
    if (/avif|avis/.test(brands)) return { accepted: false, kind: 'avif' };
    if (/hei[cxms]|hev[cxms]|mif1|msf1/.test(brands)) return { accepted: false, kind: 'heic' };
  }
  if (ascii(bytes, 0, 4) === 'II*\0' || ascii(bytes, 0, 4) === 'MM\0*') return { accepted: false, kind: 'tiff' };
  if (ascii(bytes, 0, 2) === 'BM') return { accepted: false, kind: 'bmp' };
  if (ascii(bytes, 0, 5) === '%PDF-') return { accepted: false, kind: 'pdf' };
  const head = ascii(bytes, 0, 1024).replace(/^\uFEFF/, '').trimStart().toLowerCase();
  if (head.startsWith('<svg') || (head.startsWith('<?xml') && head.includes('<svg'))) return { accepted: false, kind: 'svg' };
  return { accepted: false, kind: 'unknown' };
}

const TRY_AGAIN = 'Take the photo with the tablet camera, or save it as JPEG, and try again.';

function refusal(kind: Exclude<Sniffed, { accepted: true }>['kind']): AppError {
  switch (kind) {
    case 'heic':
      return new AppError(
        415,
        'unsupported_image_type',
        'is a HEIC photo, which the server cannot read. Set the camera to save JPEG (on an iPad: Settings › Camera › Formats › Most Compatible) and take the photo again, or export it as JPEG and upload that.',
      );
    case 'unknown':
      return new AppError(415, 'not_an_image', `is not a picture: its contents are not JPEG, PNG or WebP, whatever its name says. ${TRY_AGAIN}`);
    default:
      return new AppError(415, 'unsupported_image_type', `is ${kind === 'avif' ? 'an' : 'a'} ${kind.toUpperCase()} file; only JPEG, PNG and WebP photos are accepted. ${TRY_AGAIN}`);
  }
}

/**
 * Checks what the bytes really are, then re-encodes the picture: turned upright by its EXIF
 * orientation and written without any metadata (where the photo was taken stays off the record).
 * Refusals are AppErrors whose message continues a sentence that names the file ("Photo 2 (x.jpg) …").
 */
export async function processImage(
  bytes: Buffer,
  options: { accept?: readonly ImageMimeType[]; maxPixels?: number } = {},
): Promise<ProcessedImage> {
  const accept = options.accept ?? IMAGE_MIME_TYPES;
  const sniffed = sniffImageType(bytes);
  if (!sniffed.accepted) throw refusal(sniffed.kind);
  if (!accept.includes(sniffed.mimeType)) {
    throw new AppError(415, 'unsupported_image_type', `is ${sniffed.mimeType.replace('image/', '').toUpperCase()}; only ${accept.map((m) => m.replace('image/', '').toUpperCase()).join(' or ')} is accepted here.`);
  }

  const maxPixels = options.maxPixels ?? MAX_IMAGE_PIXELS;
  // failOn 'truncated' refuses a photo whose upload was cut short instead of storing half a picture.
  const input = sharp(bytes, { failOn: 'truncated', limitInputPixels: maxPixels }).rotate();
  try {
    const meta = await input.metadata();
    // The signature and the decoder must agree; a mismatch means a forged or damaged header.
    if (`image/${meta.format}` !== sniffed.mimeType) throw refusal('unknown');
    const encoded =
      sniffed.mimeType === 'image/jpeg'
        ? input.clone().jpeg({ quality: 90 })
        : sniffed.mimeType === 'image/png'
          ? input.clone().png()
          : input.clone().webp({ quality: 90 });
    const [original, thumb] = await Promise.all([
      encoded.toBuffer({ resolveWithObject: true }),
      input
        .clone()
        .resize({ width: THUMB_WIDTH, withoutEnlargement: true })
        .flatten({ background: '#ffffff' })
        .jpeg({ quality: 80 })
        .toBuffer(),
    ]);
    return {
      mimeType: sniffed.mimeType,
      extension: sniffed.mimeType === 'image/jpeg' ? 'jpg' : sniffed.mimeType === 'image/png' ? 'png' : 'webp',
      data: original.data,
      width: original.info.width,
      height: original.info.height,
      thumb,
    };
  } catch (err) {
    if (err instanceof AppError) throw err;
    const message = err instanceof Error ? err.message : String(err);
    if (/pixel limit/i.test(message)) {
      throw new AppError(413, 'image_too_large', `has more than ${Math.floor(maxPixels / 1_000_000)} megapixels. Lower the camera resolution and try again.`);
    }
    throw new AppError(400, 'image_damaged', 'is damaged or incomplete and cannot be read (the upload may have been cut off). Take or choose the photo again and retry.');
  }
}
