import { chromium } from 'playwright-core';
const base = 'http://127.0.0.1:3000';
const out = '/tmp/shots';
const ctx = await chromium.launchPersistentContext('/tmp/shots-profile-' + Date.now(), {
  executablePath: '/usr/bin/chromium', headless: true,
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
  viewport: { width: 1366, height: 900 },
});
const page = await ctx.newPage();
const errors = [];
page.on('pageerror', (e) => errors.push(String(e)));
page.on('console', (m) => { if (m.type() === 'error') errors.push(m.text()); });
const shot = async (name) => page.screenshot({ path: `${out}/${name}.png`, fullPage: true });

await page.goto(`${base}/workbench/resonance`);
await page.getByLabel(/Width w/).fill('2');
await page.getByLabel(/Tip mass M/).fill('100');
await page.waitForTimeout(300);
await shot('resonance-tip');

await page.goto(`${base}/workbench/peak-to-peak`);
await page.getByLabel('Indicator reads in').selectOption('nm');
await page.waitForTimeout(300);
console.log('p2p after unit change:', await page.getByLabel(/Peak-to-peak swing/).inputValue(), await page.getByLabel(/Reading resolution/).inputValue());
await page.getByLabel(/Peak-to-peak swing/).fill('150');
await page.getByLabel(/Peak-to-peak voltage/).fill('60');
await page.waitForTimeout(300);
await shot('p2p-warn');

await page.goto(`${base}/workbench/fit`);
await page.waitForTimeout(500);
await shot('fit-default');
await page.getByLabel('Displacement unit').selectOption('um');
await page.waitForTimeout(300);
await shot('fit-um');

await page.goto(`${base}/workbench/expected-gain`);
await page.getByLabel('Kind').selectOption('tube-opposite-pair');
await page.getByLabel('Material', { exact: false }).first().selectOption('PZT-5H').catch(() => {});
await page.waitForTimeout(300);
const tols = page.getByLabel(/^± /);
if (await tols.count()) { await tols.nth(0).fill('0.1'); await tols.nth(2).fill('0.02'); }
await page.waitForTimeout(300);
await shot('expected-tube');

await page.goto(`${base}/workbench/mixing`);
await page.getByLabel('Fit G from a grid').fill('Va,Vb,x,y\n0,0,250,-30\n10,0,957,681\n0,10,-470,659\n10,10,237,1369\n5,5,243,670\n');
await page.waitForTimeout(500);
await shot('mixing-fit');

for (const slug of ['units', 'loaded-gain', 'tube', 'drive-limits', 'noise-floor', 'scan-planner', 'drive-current', 'creep']) {
  await page.goto(`${base}/workbench/${slug}`);
  await page.waitForTimeout(600);
  await shot(`wb-${slug}`);
}
await page.goto(`${base}/workbench`);
await page.waitForTimeout(300);
await shot('wb-index');

await page.goto(`${base}/builds`);
await page.waitForTimeout(500);
const links = page.locator('a[href^="/builds/"]');
const hrefs = await links.evaluateAll((as) => as.map((a) => a.getAttribute('href')));
console.log('builds', hrefs.slice(0, 8));
for (const h of [...new Set(hrefs)].filter((h) => /^\/builds\/\d+$/.test(h)).slice(0, 3)) {
  await page.goto(base + h);
  await page.waitForTimeout(800);
  await shot('build-' + h.split('/').pop());
}
await page.setViewportSize({ width: 390, height: 860 });
for (const slug of ['peak-to-peak', 'tube', 'noise-floor', 'fit']) {
  await page.goto(`${base}/workbench/${slug}`);
  await page.waitForTimeout(600);
  await shot(`phone-${slug}`);
}
console.log('errors', errors);
await ctx.close();
