// Benchmark of the photo storage pipeline: a 12-megapixel camera-like JPEG → checks, auto-orient,
// display + thumbnail WebP, content-hash files on disk. No database.
// Run: node --import tsx scripts/bench-upload.ts   (npm run bench:upload)
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { LocalPhotoStore } from '../server/storage/local-photo-store.ts';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import sharp from 'sharp';
import { processPhoto, writeVariants } from '../server/services/photo-storage.ts';

const WIDTH = 4000;
const HEIGHT = 3000;
const WARMUP_RUNS = 1;
const TIMED_RUNS = 7;

/** Smooth gradient plus gaussian sensor noise: compresses like a real photo rather than a flat fill. */
async function cameraLikeJpeg(): Promise<Buffer> {
  const gradient = await sharp(Buffer.from([40, 90, 150, 200, 170, 120, 230, 210, 90, 60, 130, 70]), {
    raw: { width: 2, height: 2, channels: 3 },
  })
    .resize(WIDTH, HEIGHT, { kernel: 'linear' })
    .png()
    .toBuffer();
  const noise = await sharp({
    create: { width: WIDTH, height: HEIGHT, channels: 3, background: '#808080', noise: { type: 'gaussian', mean: 128, sigma: 14 } },
  })
    .png()
    .toBuffer();
  return sharp(gradient)
    .composite([{ input: noise, blend: 'overlay' }])
    .jpeg({ quality: 90 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

async function once(input: Buffer): Promise<{ ms: number; files: number }> {
  const dir = await mkdtemp(join(tmpdir(), 'scanwright-bench-'));
  try {
    const t0 = performance.now();
    const processed = await processPhoto(input);
    await writeVariants(new LocalPhotoStore(dir), [processed]);
    const ms = performance.now() - t0;
    return { ms, files: (await readdir(dir)).length };
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

const input = await cameraLikeJpeg();
const sample = await processPhoto(input);
console.log(
  `input: ${WIDTH}×${HEIGHT} JPEG, ${(input.length / 1024 / 1024).toFixed(2)} MB → display ${sample.display.width}×${sample.display.height} ` +
    `(${(sample.display.bytes.length / 1024).toFixed(0)} KB), thumb ${sample.thumb.width}×${sample.thumb.height} (${(sample.thumb.bytes.length / 1024).toFixed(0)} KB)`,
);
for (let i = 0; i < WARMUP_RUNS; i++) await once(input);
const ms: number[] = [];
for (let i = 0; i < TIMED_RUNS; i++) {
  const run = await once(input);
  if (run.files !== 2) throw new Error(`expected 2 stored files, found ${run.files}`);
  ms.push(run.ms);
}
ms.sort((a, b) => a - b);
console.log(
  `processPhoto + writeVariants: median ${ms[Math.floor(ms.length / 2)].toFixed(0)} ms, min ${ms[0].toFixed(0)} ms, max ${ms[ms.length - 1].toFixed(0)} ms ` +
    `(${TIMED_RUNS} runs after ${WARMUP_RUNS} warm-up; sharp concurrency ${sharp.concurrency()})`,
);
