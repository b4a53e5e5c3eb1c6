// A greyscale PNG (8 or 16 bits per sample) read in the browser into a height image: fast-png decodes every
// bit depth, where a canvas would give 8 bits only. Colour images are turned into grey by the mean of R, G, B.
import { decode } from 'fast-png';

export function pngToHeights(bytes: ArrayBuffer): { rows: Float64Array[]; bitDepth: number; width: number; height: number } {
  const png = decode(new Uint8Array(bytes));
  const { width, height, channels, depth } = png;
  const data = png.data as ArrayLike<number>;
  const colour = channels >= 3 ? 3 : 1;
  const rows: Float64Array[] = [];
  for (let y = 0; y < height; y++) {
    const row = new Float64Array(width);
    for (let x = 0; x < width; x++) {
      const i = (y * width + x) * channels;
      let v = 0;
      for (let c = 0; c < colour; c++) v += data[i + c]!;
      row[x] = v / colour;
    }
    rows.push(row);
  }
  return { rows, bitDepth: depth, width, height };
}
