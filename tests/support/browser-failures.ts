// Browser project setup: when a test fails, every page still open is photographed
// (test-output/screenshots/failed-*.png) and its address and visible text are printed, so a
// failure on a CI machine says what the page showed rather than only which locator timed out.
import { beforeEach } from 'vitest';
import { mkdirSync } from 'node:fs';
import { openContexts, SCREENSHOTS } from './browser.ts';

beforeEach(({ task, onTestFailed }) => {
  onTestFailed(async () => {
    mkdirSync(SCREENSHOTS, { recursive: true });
    const name = task.name.replace(/[^a-z0-9]+/gi, '-').slice(0, 60);
    let n = 0;
    for (const context of openContexts) {
      for (const page of context.pages()) {
        n += 1;
        const path = `${SCREENSHOTS}/failed-${name}-${n}.png`;
        const text = await page
          .locator('body')
          .innerText({ timeout: 2000 })
          .catch((e: Error) => `(no text: ${e.message})`);
        await page.screenshot({ path, fullPage: true }).catch(() => undefined);
        console.log(`[failed test page ${n}] ${page.url()} → ${path}\n${text.slice(0, 1500)}`);
      }
    }
  });
});
