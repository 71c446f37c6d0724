import { crc32 } from 'node:zlib';
import sharp from 'sharp';

/** A small solid-colour image made in the test, so no binary fixtures live in the repository. */
export function makeImage(format: 'jpeg' | 'png' | 'webp', width = 64, height = 48): Promise<Buffer> {
  const image = sharp({ create: { width, height, channels: 3, background: '#8a4b2f' } });
  return image[format]().toBuffer();
}

/** A phone-style JPEG: turned by EXIF orientation 6, with a GPS position and an author tag. */
export function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 60, height: 30, channels: 3, background: '#305070' } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExif({
      IFD0: { Artist: 'dwell-exif-marker' },
      // libvips calls the GPS directory IFD3.
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '39/1 44/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '104/1 59/1 0/1' },
    })
    .toBuffer();
}

/**
 * A valid 1×1 PNG whose header claims 30000×30000 pixels: 900 megapixels to decode from a few bytes,
 * the shape of a decompression bomb. The IHDR checksum is recomputed (PNG spec, RFC 2083 §3.4) so the
 * decoder trusts the header.
 */
export async function pngBomb(): Promise<Buffer> {
  const png = Buffer.from(await makeImage('png', 1, 1));
  // Signature (8) + chunk length (4) + "IHDR" (4), then width and height as big-endian 32-bit numbers.
  png.writeUInt32BE(30000, 16);
  png.writeUInt32BE(30000, 20);
  png.writeUInt32BE(crc32(png.subarray(12, 29)), 29);
  return png;
}

/** EXIF's pointer to the GPS directory (tag 0x8825), as it appears in a little-endian EXIF block. */
export const GPS_POINTER_LE = Buffer.from([0x25, 0x88]);
