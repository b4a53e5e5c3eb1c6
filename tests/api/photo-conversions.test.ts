// Photo conversions are queued: a burst of uploads never decodes more than MAX_CONCURRENT_CONVERSIONS at once.
import { expect, test } from 'vitest';
import { setImmediate as tick } from 'node:timers/promises';
import { conversionLoad, MAX_CONCURRENT_CONVERSIONS, processPhoto } from '../../server/services/photo-storage.ts';
import { noisyJpeg } from '../support/images.ts';

test('when more photos arrive at once than may convert together, then the rest wait and every one is converted', async () => {
  const files = await Promise.all(Array.from({ length: MAX_CONCURRENT_CONVERSIONS + 4 }, () => noisyJpeg(900, 700)));
  let maxActive = 0;
  let sawWaiting = false;
  let done = false;
  const all = Promise.all(files.map((f, i) => processPhoto(f, i))).finally(() => {
    done = true;
  });
  while (!done) {
    const load = conversionLoad();
    maxActive = Math.max(maxActive, load.active);
    sawWaiting ||= load.waiting > 0;
    await tick();
  }
  const converted = await all;
  expect(converted).toHaveLength(files.length);
  expect(new Set(converted.map((c) => c.contentHash)).size).toBe(files.length);
  expect(maxActive).toBe(MAX_CONCURRENT_CONVERSIONS);
  expect(sawWaiting).toBe(true);
  expect(conversionLoad()).toEqual({ active: 0, waiting: 0 });
});
