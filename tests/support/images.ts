import { randomInt } from 'node:crypto';
import { deflateSync } from 'node:zlib';
import sharp from 'sharp';

type Rgb = { r: number; g: number; b: number };

/** A colour no other test picks (with overwhelming odds), so content-hash de-duplication never links two tests. */
export const randomColour = (): Rgb => ({ r: randomInt(256), g: randomInt(256), b: randomInt(256) });

/** Where a photo was taken, as a phone writes it into EXIF (51°30′N 0°7′W). */
export const GPS_EXIF = {
  IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
};

/** A plain-colour JPEG; with `gps` it carries a GPS position, with `orientation` an EXIF Orientation tag. */
export async function jpeg(
  width: number,
  height: number,
  opts: { colour?: Rgb; gps?: boolean; orientation?: number } = {},
): Promise<Buffer> {
  let img = sharp({ create: { width, height, channels: 3, background: opts.colour ?? randomColour() } }).jpeg({ quality: 90 });
  if (opts.orientation) img = img.withMetadata({ orientation: opts.orientation });
  if (opts.gps) img = img.withExifMerge(GPS_EXIF);
  return img.toBuffer();
}

/** A JPEG with camera-like noise, so its size and decode cost resemble a real photo. */
export async function noisyJpeg(width: number, height: number, quality = 88): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: randomColour(), noise: { type: 'gaussian', mean: 128, sigma: 24 } } })
    .jpeg({ quality })
    .toBuffer();
}

/** Left half red, right half blue, stored sideways with EXIF Orientation 6 (a phone held upright): shown upright, red is on top. */
export async function sidewaysJpeg(width = 300, height = 200): Promise<Buffer> {
  const red = await sharp({ create: { width: width / 2, height, channels: 3, background: { r: 255, g: 0, b: 0 } } })
    .png()
    .toBuffer();
  return sharp({ create: { width, height, channels: 3, background: { r: 0, g: 0, b: 255 } } })
    .composite([{ input: red, left: 0, top: 0 }])
    .jpeg({ quality: 95 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** A PNG with an alpha channel. */
export async function png(width: number, height: number): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 4, background: { ...randomColour(), alpha: 0.6 } } })
    .png()
    .toBuffer();
}

/** The first `fraction` of a noisy JPEG: it still starts like a JPEG but its scan data stops early. */
export async function truncatedJpeg(fraction = 0.6): Promise<Buffer> {
  const whole = await noisyJpeg(400, 300);
  return whole.subarray(0, Math.floor(whole.length * fraction));
}

const crc32 = (() => {
  const table = Array.from({ length: 256 }, (_, n) => {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  return (buf: Buffer) => {
    let c = 0xffffffff;
    for (const byte of buf) c = table[(c ^ byte) & 0xff] ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
})();

function pngChunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
  return Buffer.concat([head, data, crc]);
}

/**
 * A decompression bomb: a valid 1-bit greyscale PNG of `side`×`side` black pixels that is only
 * tens of kilobytes on the wire (built with zlib; sharp itself refuses to write one this large quickly).
 */
export function pixelBombPng(side = 20_000): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(side, 0);
  ihdr.writeUInt32BE(side, 4);
  ihdr.set([1, 0, 0, 0, 0], 8); // bit depth 1, greyscale, deflate, adaptive filtering, no interlace
  const raw = Buffer.alloc(side * (1 + Math.ceil(side / 8))); // every row: filter byte 0, then zero bits
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    pngChunk('IDAT', deflateSync(raw, { level: 9 })),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

/** `bytes` long and starting like a JPEG, without the cost of encoding one that large. */
export function oversizeJpeg(bytes: number): Buffer {
  const buf = Buffer.alloc(bytes);
  buf.set([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00]);
  return buf;
}

/**
 * The GPS tags of an EXIF block (as sharp's metadata() returns it), keyed by tag name, or null
 * when there is no GPS directory. Reads only ASCII and RATIONAL values, which is all GPS position needs.
 */
export function readGps(exif: Buffer | undefined): Record<string, string> | null {
  if (!exif) return null;
  const base = exif.subarray(0, 6).toString('latin1') === 'Exif\0\0' ? 6 : 0;
  const le = exif.toString('latin1', base, base + 2) === 'II';
  const u16 = (o: number) => (le ? exif.readUInt16LE(base + o) : exif.readUInt16BE(base + o));
  const u32 = (o: number) => (le ? exif.readUInt32LE(base + o) : exif.readUInt32BE(base + o));
  const entries = (ifd: number) => Array.from({ length: u16(ifd) }, (_, i) => ifd + 2 + i * 12);
  const pointer = entries(u32(4)).find((e) => u16(e) === 0x8825);
  if (pointer === undefined) return null;
  const names: Record<number, string> = { 1: 'GPSLatitudeRef', 2: 'GPSLatitude', 3: 'GPSLongitudeRef', 4: 'GPSLongitude' };
  const out: Record<string, string> = {};
  for (const e of entries(u32(pointer + 8))) {
    const [tag, type, count] = [u16(e), u16(e + 2), u32(e + 4)];
    const at = count * (type === 5 ? 8 : 1) <= 4 ? e + 8 : u32(e + 8);
    const name = names[tag] ?? `tag${tag}`;
    if (type === 2) out[name] = exif.toString('latin1', base + at, base + at + count).replace(/\0+$/, '');
    if (type === 5) out[name] = Array.from({ length: count }, (_, i) => `${u32(at + i * 8)}/${u32(at + i * 8 + 4)}`).join(' ');
  }
  return out;
}
