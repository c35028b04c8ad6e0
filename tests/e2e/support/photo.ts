import sharp from 'sharp';

/** A small JPEG made here (a grey square with a darker band), as a tablet camera would hand it over. */
export async function smallJpeg(): Promise<Buffer> {
  const band = Buffer.from('<svg width="320" height="240"><rect width="320" height="240" fill="#8a8f96"/><rect y="100" width="320" height="40" fill="#303438"/></svg>');
  return sharp(band).jpeg({ quality: 80 }).toBuffer();
}
