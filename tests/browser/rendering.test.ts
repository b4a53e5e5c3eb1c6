import { describe, expect, test } from 'vitest';
import { journey, snapshot } from '../support/browser.ts';
import { createBuildRow, createUser } from '../support/factories.ts';
import { LogEntry } from '../../server/models/log-entry.model.ts';

const HOSTILE = [
  '# Hostile write-up',
  '<script>window.__pwned = "script"</script>',
  '<img src="x" onerror="window.__pwned = \'onerror\'">',
  '<iframe src="javascript:window.top.__pwned=\'iframe\'"></iframe>',
  '[click me](javascript:window.__pwned=%22link%22)',
  '[data link](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)',
  '<a href="javascript:window.__pwned=1">raw anchor</a>',
  '<div style="background:url(javascript:alert(1))" onclick="window.__pwned=\'click\'">raw div</div>',
  '![img](javascript:window.__pwned=%22img%22)',
  '[ok link](https://example.org/fine)',
].join('\n\n');

describe('journey: hostile Markdown renders inert under the Content-Security-Policy', () => {
  const j = journey();

  test('when a published build carries scripts, handlers, javascript: and data: links, then nothing runs and unsafe links are emptied', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'published', title: 'Hostile rendering check' });
    await build.update({ body: HOSTILE });
    await LogEntry.create({
      buildId: build.id,
      entryDate: '2026-11-30',
      title: 'Entry with HTML',
      body: '<script>window.__pwned="entry"</script> <b onmouseover="window.__pwned=\'b\'">bold?</b>',
    });
    const { page } = j.browser;
    const dialogs: string[] = [];
    page.on('dialog', async (d) => {
      dialogs.push(d.message());
      await d.dismiss();
    });
    await page.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (e) => {
        (window as unknown as { __violations: string[] }).__violations ??= [];
        (window as unknown as { __violations: string[] }).__violations.push(`${e.violatedDirective} ${e.blockedURI}`);
      });
    });
    const response = await page.goto(`${j.live.baseUrl}/builds/${build.id}`);
    const csp = response!.headers()['content-security-policy']!;
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toContain('unsafe-inline');
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    await page.getByRole('heading', { name: 'Hostile write-up' }).waitFor();

    const article = page.locator('.sw-prose').first();
    expect(await article.locator('script, iframe, img[onerror], [onclick], [onmouseover]').count()).toBe(0);
    for (const name of ['click me', 'data link']) {
      const href = await page.getByRole('link', { name }).getAttribute('href');
      expect(href ?? '').not.toMatch(/^(javascript|data):/i);
    }
    expect(await page.getByRole('link', { name: 'ok link' }).getAttribute('href')).toBe('https://example.org/fine');
    // Raw HTML tags are dropped: an inline anchor's text may remain as plain text, but never as a link.
    expect(await page.getByRole('link', { name: 'raw anchor' }).count()).toBe(0);
    expect(await page.locator('text=raw div').count()).toBe(0);

    await page
      .getByRole('link', { name: 'click me' })
      .click({ timeout: 2000 })
      .catch(() => {});
    await page
      .locator('text=bold?')
      .hover({ timeout: 2000 })
      .catch(() => {});
    expect(await page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned)).toBeUndefined();
    expect(dialogs).toEqual([]);

    // The policy itself blocks inline script even if something slipped into the DOM.
    await page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'window.__pwned = "inline"';
      document.body.appendChild(s);
    });
    expect(await page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned)).toBeUndefined();
    const seen = await page.evaluate(() => (window as unknown as { __violations?: string[] }).__violations ?? []);
    expect(seen.some((v) => v.startsWith('script-src'))).toBe(true);
    await snapshot(page, 'hostile-markdown');
  });
});
