import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { AppError } from '../../lib/errors';
import { processImage, sniffImageType, THUMB_WIDTH } from './image-processing';
import { TEST_CAMERA_MAKE, cameraJpeg, gif, heicContainer, noisyJpeg, pngWithAlpha, svg, truncatedJpeg, webp } from './test-images';

async function refusal(bytes: Buffer, options?: Parameters<typeof processImage>[1]): Promise<AppError> {
  const err = await processImage(bytes, options).then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  return err as AppError;
}

/** The EXIF tag 0x8825 points at the GPS block; either byte order. */
const hasGpsPointer = (exif: Buffer) => exif.includes(Buffer.from([0x88, 0x25])) || exif.includes(Buffer.from([0x25, 0x88]));

describe('sniffImageType', () => {
  it('knows JPEG, PNG and WebP by their first bytes', async () => {
    expect(sniffImageType(await cameraJpeg())).toEqual({ accepted: true, mimeType: 'image/jpeg' });
    expect(sniffImageType(await pngWithAlpha())).toEqual({ accepted: true, mimeType: 'image/png' });
    expect(sniffImageType(await webp())).toEqual({ accepted: true, mimeType: 'image/webp' });
  });

  it('names the formats it refuses', async () => {
    expect(sniffImageType(await gif())).toEqual({ accepted: false, kind: 'gif' });
    expect(sniffImageType(svg())).toEqual({ accepted: false, kind: 'svg' });
    expect(sniffImageType(heicContainer())).toEqual({ accepted: false, kind: 'heic' });
    expect(sniffImageType(await sharp({ create: { width: 8, height: 8, channels: 3, background: '#000' } }).avif().toBuffer())).toEqual({ accepted: false, kind: 'avif' });
    expect(sniffImageType(Buffer.from('Just some notes typed on the tablet'))).toEqual({ accepted: false, kind: 'unknown' });
    expect(sniffImageType(Buffer.alloc(0))).toEqual({ accepted: false, kind: 'unknown' });
  });
});

describe('processImage', () => {
  it('turns a camera JPEG upright and leaves no EXIF, GPS or XMP in the stored picture', async () => {
    const input = await cameraJpeg(800, 600);
    const before = await sharp(input).metadata();
    expect(before.exif?.toString('latin1')).toContain(TEST_CAMERA_MAKE);
    expect(hasGpsPointer(before.exif!)).toBe(true);
    expect(before.xmp).toBeDefined();

    const out = await processImage(input);
    const after = await sharp(out.data).metadata();
    expect(out.mimeType).toBe('image/jpeg');
    expect(after.format).toBe('jpeg');
    expect([out.width, out.height]).toEqual([600, 800]);
    expect([after.width, after.height]).toEqual([600, 800]);
    expect(after.exif).toBeUndefined();
    expect(after.xmp).toBeUndefined();
    expect(after.iptc).toBeUndefined();
    expect(after.orientation).toBeUndefined();
    expect(out.data.includes(TEST_CAMERA_MAKE)).toBe(false);
    expect(out.data.includes('GPS')).toBe(false);
  });

  it('makes a JPEG thumbnail 320 pixels wide that keeps the upright shape', async () => {
    const out = await processImage(await cameraJpeg(800, 600));
    const thumb = await sharp(out.thumb).metadata();
    expect(thumb.format).toBe('jpeg');
    expect(thumb.width).toBe(THUMB_WIDTH);
    expect(thumb.height).toBe(Math.round((THUMB_WIDTH * 800) / 600));
    expect(thumb.exif).toBeUndefined();
  });

  it('keeps PNG as PNG with its transparency, and lays the thumbnail on white', async () => {
    const out = await processImage(await pngWithAlpha(500, 200));
    expect(out.mimeType).toBe('image/png');
    expect(out.extension).toBe('png');
    expect((await sharp(out.data).metadata()).hasAlpha).toBe(true);
    const { data } = await sharp(out.thumb).raw().toBuffer({ resolveWithObject: true });
    // Half-transparent blue on white, not on black: every channel stays well above zero.
    expect(Math.min(data[0]!, data[1]!, data[2]!)).toBeGreaterThan(100);
  });

  it('keeps WebP as WebP and does not enlarge a thumbnail of a small picture', async () => {
    const out = await processImage(await webp(200, 100));
    expect(out.mimeType).toBe('image/webp');
    expect((await sharp(out.thumb).metadata()).width).toBe(200);
  });

  it('refuses text whatever it is called, naming JPEG, PNG and WebP as what is accepted', async () => {
    const err = await refusal(Buffer.from('not a picture, although it may be called photo.jpg'));
    expect([err.status, err.code]).toEqual([415, 'not_an_image']);
    expect(err.message).toMatch(/JPEG, PNG or WebP/);
  });

  it.each([
    ['GIF', gif],
    ['SVG', async () => svg()],
  ])('refuses a %s image with 415', async (name, make) => {
    const err = await refusal(await make());
    expect([err.status, err.code]).toEqual([415, 'unsupported_image_type']);
    expect(err.message).toContain(`${name} file; only JPEG, PNG and WebP`);
  });

  it('refuses a HEIC photo with 415 and says how to get JPEG from the tablet', async () => {
    const err = await refusal(heicContainer());
    expect([err.status, err.code]).toEqual([415, 'unsupported_image_type']);
    expect(err.message).toMatch(/HEIC.*Most Compatible/);
  });

  it('is refusing HEIC because this sharp build reads the container but cannot decode HEVC', async () => {
    // If a future sharp build decodes HEVC, this fails: then HEIC could be converted to JPEG instead.
    const meta = await sharp(heicContainer()).metadata();
    expect([meta.format, meta.compression]).toEqual(['heif', 'hevc']);
    await expect(sharp(heicContainer()).jpeg().toBuffer()).rejects.toThrow(/HEVC/);
  });

  it('refuses a JPEG that was cut off part way with 400', async () => {
    const err = await refusal(await truncatedJpeg());
    expect([err.status, err.code]).toEqual([400, 'image_damaged']);
  });

  it('refuses a picture with a JPEG signature and garbage after it', async () => {
    const err = await refusal(Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.from('garbage'.repeat(50))]));
    expect(err.status).toBe(400);
  });

  it('refuses a picture with more pixels than the limit with 413', async () => {
    const err = await refusal(await noisyJpeg(20_000), { maxPixels: 10_000 });
    expect([err.status, err.code]).toEqual([413, 'image_too_large']);
  });

  it('accepts only the types asked for', async () => {
    const err = await refusal(await cameraJpeg(), { accept: ['image/png'] });
    expect(err.status).toBe(415);
    expect(err.message).toBe('is JPEG; only PNG is accepted here.');
  });
});
