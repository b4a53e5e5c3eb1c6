// A minimal baseline TIFF writer for tests (TIFF 6.0, Adobe 1992, §2 "Baseline TIFF" and §19 SampleFormat):
// little-endian, one strip, no compression, one greyscale sample per pixel. Written here so the server's
// decoder (sharp/libvips) is checked against files made independently of it.

type Sample = 'uint8' | 'uint16' | 'float32';

/** Encode `pixels` (row-major, width × height) as a greyscale TIFF of the given sample type. */
export function greyTiff(width: number, height: number, pixels: ArrayLike<number>, sample: Sample): Buffer {
  const bytes = sample === 'uint8' ? 1 : sample === 'uint16' ? 2 : 4;
  // Tags (sorted ascending, as the spec requires): [tag, type (3 SHORT, 4 LONG), value].
  const dataOffset = 8 + 2 + 10 * 12 + 4;
  const tags: [number, number, number][] = [
    [256, 4, width], // ImageWidth
    [257, 4, height], // ImageLength
    [258, 3, bytes * 8], // BitsPerSample
    [259, 3, 1], // Compression: none
    [262, 3, 1], // PhotometricInterpretation: BlackIsZero
    [273, 4, dataOffset], // StripOffsets
    [277, 3, 1], // SamplesPerPixel
    [278, 4, height], // RowsPerStrip
    [279, 4, width * height * bytes], // StripByteCounts
    [339, 3, sample === 'float32' ? 3 : 1], // SampleFormat: 1 unsigned integer, 3 IEEE float
  ];
  const buf = Buffer.alloc(dataOffset + width * height * bytes);
  buf.write('II', 0, 'latin1');
  buf.writeUInt16LE(42, 2);
  buf.writeUInt32LE(8, 4);
  buf.writeUInt16LE(tags.length, 8);
  tags.forEach(([tag, type, value], i) => {
    const o = 10 + i * 12;
    buf.writeUInt16LE(tag, o);
    buf.writeUInt16LE(type, o + 2);
    buf.writeUInt32LE(1, o + 4);
    if (type === 3) buf.writeUInt16LE(value, o + 8);
    else buf.writeUInt32LE(value, o + 8);
  });
  buf.writeUInt32LE(0, 10 + tags.length * 12);
  for (let i = 0; i < width * height; i++) {
    const o = dataOffset + i * bytes;
    if (sample === 'uint8') buf.writeUInt8(pixels[i]!, o);
    else if (sample === 'uint16') buf.writeUInt16LE(pixels[i]!, o);
    else buf.writeFloatLE(pixels[i]!, o);
  }
  return buf;
}
