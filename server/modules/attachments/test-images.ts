// Pictures made on the fly for the attachment tests (never shipped, never read from disk).
import sharp from 'sharp';

/** Where the invented test photo claims it was taken: these values must not survive the upload. */
export const TEST_GPS = { GPSLatitudeRef: 'N', GPSLatitude: '47/1 36/1 0/1', GPSLongitudeRef: 'E', GPSLongitude: '7/1 35/1 0/1' };
export const TEST_CAMERA_MAKE = 'InventedCam';

const canvas = (width: number, height: number, alpha = false) =>
  sharp({ create: { width, height, channels: alpha ? 4 : 3, background: alpha ? { r: 40, g: 90, b: 160, alpha: 0.5 } : { r: 40, g: 90, b: 160 } } });

/**
 * A camera-like JPEG: EXIF with a camera make and a GPS position, an XMP packet with the
 * position again, and EXIF orientation 6 (stored sideways, shown upright after a quarter turn).
 */
export function cameraJpeg(width = 800, height = 600): Promise<Buffer> {
  return canvas(width, height)
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExifMerge({ IFD0: { Make: TEST_CAMERA_MAKE }, IFD3: TEST_GPS })
    .withXmp(
      '<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#"><rdf:Description xmlns:exif="http://ns.adobe.com/exif/1.0/" exif:GPSLatitude="47,36.0N"/></rdf:RDF></x:xmpmeta>',
    )
    .toBuffer();
}

export const plainJpeg = (width = 400, height = 300) => canvas(width, height).jpeg().toBuffer();
export const pngWithAlpha = (width = 500, height = 200) => canvas(width, height, true).png().toBuffer();
export const webp = (width = 640, height = 480) => canvas(width, height).webp().toBuffer();
export const gif = () => canvas(40, 30).gif().toBuffer();
export const svg = () => Buffer.from('<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg" width="40" height="30"><rect width="40" height="30" fill="red"/></svg>');

/** A JPEG whose upload was cut off part way. */
export async function truncatedJpeg(): Promise<Buffer> {
  const whole = await canvas(800, 600).jpeg().toBuffer();
  return whole.subarray(0, Math.floor(whole.length * 0.6));
}

/** Random pixels compress badly, so this JPEG is about `approxBytes` long whatever the quality. */
export function noisyJpeg(approxBytes: number): Promise<Buffer> {
  const side = Math.ceil(Math.sqrt(approxBytes / 1.5));
  const raw = Buffer.alloc(side * side * 3);
  for (let i = 0; i < raw.length; i++) raw[i] = (i * 2654435761) >>> 24;
  return sharp(raw, { raw: { width: side, height: side, channels: 3 } }).jpeg({ quality: 100 }).toBuffer();
}

const u8 = (n: number) => Buffer.from([n]);
const u16 = (n: number) => {
  const b = Buffer.alloc(2);
  b.writeUInt16BE(n);
  return b;
};
const u32 = (n: number) => {
  const b = Buffer.alloc(4);
  b.writeUInt32BE(n);
  return b;
};
const box = (type: string, ...parts: Buffer[]) => {
  const body = Buffer.concat(parts);
  return Buffer.concat([u32(8 + body.length), Buffer.from(type, 'latin1'), body]);
};
const fullBox = (type: string, version: number, ...parts: Buffer[]) => box(type, u8(version), u8(0), u16(0), ...parts);

/**
 * A well-formed HEIC container (ISO/IEC 23008-12: ftyp, meta with one hvc1 item and its hvcC
 * configuration, mdat) around a few bytes of HEVC data, as a tablet camera set to "high
 * efficiency" writes. Enough for a decoder to identify it as HEIC; too little to show a picture.
 */
export function heicContainer(width = 64, height = 48): Buffer {
  const payload = Buffer.from([0, 0, 0, 4, 0x26, 0x01, 0xaf, 0x00]);
  const ftyp = box('ftyp', Buffer.from('heic', 'latin1'), u32(0), Buffer.from('mif1heic', 'latin1'));
  const hvcC = box('hvcC', u8(1), u8(0x01), u32(0x60000000), Buffer.alloc(6), u8(90), u16(0xf000), u8(0xfc), u8(0xfd), u8(0xf8), u8(0xf8), u16(0), u8(0x0f), u8(0));
  const ipco = box('ipco', hvcC, fullBox('ispe', 0, u32(width), u32(height)));
  const ipma = fullBox('ipma', 0, u32(1), u16(1), u8(2), u8(0x81), u8(0x02));
  const head = (mdatOffset: number) =>
    Buffer.concat([
      ftyp,
      fullBox(
        'meta',
        0,
        fullBox('hdlr', 0, u32(0), Buffer.from('pict', 'latin1'), Buffer.alloc(12), u8(0)),
        fullBox('pitm', 0, u16(1)),
        fullBox('iloc', 0, u8(0x44), u8(0), u16(1), u16(1), u16(0), u16(1), u32(mdatOffset), u32(payload.length)),
        fullBox('iinf', 0, u16(1), fullBox('infe', 2, u16(1), u16(0), Buffer.from('hvc1', 'latin1'), u8(0))),
        box('iprp', ipco, ipma),
      ),
    ]);
  // The item's data starts right after the mdat box header, which follows the fixed-size head.
  return Buffer.concat([head(head(0).length + 8), box('mdat', payload)]);
}
