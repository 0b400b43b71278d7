// A realistic 12 MP phone photo for the image benchmarks: textured pixels (so JPEG works as
// hard as on a real shot), stored rotated with EXIF orientation 6 and a GPS position.
import sharp from 'sharp';

export async function phonePhoto(seed = 0) {
  const w = 4000;
  const h = 3000;
  const tile = Buffer.alloc(400 * 300 * 3);
  for (let i = 0; i < tile.length; i++) tile[i] = (i * 7 + seed * 13 + ((i / 1200) | 0) * 3) % 251;
  const noise = await sharp(tile, { raw: { width: 400, height: 300, channels: 3 } })
    .resize(w, h, { kernel: 'cubic' })
    .png()
    .toBuffer();
  return sharp(noise)
    .withMetadata({ orientation: 6 })
    .withExif({ IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' } })
    .jpeg({ quality: 90 })
    .toBuffer();
}

export const SIZES = [320, 1600, 2400];

/** The least an app could do: three upright sizes from one bare sharp pipeline per size. */
export async function bareThreeSizes(buf) {
  await Promise.all(SIZES.map((s) => sharp(buf).rotate().resize(s, s, { fit: 'inside' }).jpeg({ quality: 82 }).toBuffer()));
}
