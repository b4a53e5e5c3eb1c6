// Mouse gestures on a chart drawn by src/components/charts/uplot-chart.tsx, for bench:plot and the zoom browser test:
// a drag across the plot (zoom), the same with shift held (pan), and the x range the chart shows (`data-x-range`).
import type { Locator, Page } from 'playwright-core';

/** The plot's box on the page. */
type Box = { x: number; y: number; width: number; height: number };

/** Drags across the plot at 40 % of its height, from and to fractions of its width; with `shift`, a pan. */
export async function dragAcross(page: Page, box: Box, from: number, to: number, { shift = false } = {}): Promise<void> {
  const y = box.y + box.height * 0.4;
  if (shift) await page.keyboard.down('Shift');
  await page.mouse.move(box.x + box.width * from, y);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width * ((from + to) / 2), y, { steps: 5 });
  await page.mouse.move(box.x + box.width * to, y, { steps: 5 });
  await page.mouse.up();
  if (shift) await page.keyboard.up('Shift');
}

/** The x range the chart shows now. */
export async function xRange(plot: Locator): Promise<[number, number]> {
  const raw = (await plot.getAttribute('data-x-range')) ?? 'NaN,NaN';
  const [a, b] = raw.split(',').map(Number);
  return [a!, b!];
}
