// A greyscale height image (PNG or TIFF, 8 or 16 bits per sample, or 32-bit float TIFF) decoded by sharp
// (libvips) into rows of numbers for the lattice analysis. Colour images become grey by the mean of R, G and
// B, as the page's own PNG reader does (src/features/workbench/lattice/decode-png.ts); alpha is ignored.
import sharp from 'sharp';
import { MAX_IMAGE_SIDE, MIN_IMAGE_SIDE } from '@shared/workbench/lattice-limits.ts';
import { AppError } from '../errors.ts';

export interface HeightImage {
  format: 'png' | 'tiff';
  width: number;
  height: number;
  /** Bits per sample of the file: 8, 16 or 32 (float). */
  bitDepth: 8 | 16 | 32;
  heights: number[][];
}

const unreadable = () => new AppError(400, 'unreadable_image', 'The file could not be read as a PNG or TIFF image.');

export async function decodeHeightImage(bytes: Buffer): Promise<HeightImage> {
  // Refuse before decoding anything larger than the analysis takes (libvips reads the header only here).
  const image = sharp(bytes, { limitInputPixels: MAX_IMAGE_SIDE * MAX_IMAGE_SIDE, failOn: 'error' });
  const meta = await image.metadata().catch(() => {
    throw unreadable();
  });
  if (meta.format !== 'png' && meta.format !== 'tiff')
    throw new AppError(
      415,
      'unsupported_image',
      `This is a${meta.format ? ` ${meta.format}` : 'n unknown'} file: send a greyscale PNG or TIFF.`,
    );
  const { width = 0, height = 0 } = meta;
  if (width > MAX_IMAGE_SIDE || height > MAX_IMAGE_SIDE)
    throw new AppError(
      400,
      'image_too_large',
      `The image is ${width} × ${height}; at most ${MAX_IMAGE_SIDE} × ${MAX_IMAGE_SIDE} is analysed.`,
    );
  if (width < MIN_IMAGE_SIDE || height < MIN_IMAGE_SIDE)
    throw new AppError(
      400,
      'image_too_small',
      `The image is ${width} × ${height}; at least ${MIN_IMAGE_SIDE} × ${MIN_IMAGE_SIDE} is needed.`,
    );
  const colour = (meta.channels ?? 1) >= 3;
  const depth = meta.depth === 'float' ? 'float' : meta.depth === 'ushort' ? 'ushort' : 'uchar';
  const pipeline =
    depth === 'float'
      ? image.raw({ depth: 'float' })
      : image.toColourspace(depth === 'ushort' ? (colour ? 'rgb16' : 'grey16') : colour ? 'srgb' : 'b-w').raw({ depth });
  const { data, info } = await pipeline.toBuffer({ resolveWithObject: true }).catch(() => {
    throw unreadable();
  });
  const samples =
    depth === 'float'
      ? new Float32Array(data.buffer, data.byteOffset, data.length / 4)
      : depth === 'ushort'
        ? new Uint16Array(data.buffer, data.byteOffset, data.length / 2)
        : new Uint8Array(data.buffer, data.byteOffset, data.length);
  // libvips may hand a one-channel float image back as three equal channels: read the first only.
  const used = colour ? 3 : 1;
  const stride = info.channels;
  const heights: number[][] = [];
  for (let y = 0; y < info.height; y++) {
    const row = new Array<number>(info.width);
    for (let x = 0; x < info.width; x++) {
      const i = (y * info.width + x) * stride;
      let v = 0;
      for (let c = 0; c < used; c++) v += samples[i + c]!;
      row[x] = v / used;
    }
    heights.push(row);
  }
  return {
    format: meta.format,
    width: info.width,
    height: info.height,
    bitDepth: depth === 'float' ? 32 : depth === 'ushort' ? 16 : 8,
    heights,
  };
}
