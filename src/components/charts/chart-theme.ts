// The one chart theme: colours (the same values as the tokens in src/index.css) and the fonts of ticks and axis
// labels on the canvas, for every plot in the app.
export const chartColors = {
  ink: '#1D232B',
  inkSoft: '#4A525C',
  rule: '#D8D3C8',
  copper: '#B5532A',
  teal: '#2F6F73',
  tealDark: '#23575A',
  amber: '#C98A00',
  danger: '#B42318',
} as const;

/** What charts are drawn on: the white card, inside the page's paper (`--color-paper`). */
export const chartBackgrounds = { card: '#FFFFFF', paper: '#F6F4EF' } as const;

/** Tick figures and axis labels: ink-soft, 8.0:1 on white and 7.4:1 on the paper (WCAG 2.1 asks 4.5:1). */
export const axisColor = chartColors.inkSoft;

/** Tick figures in the monospace used for every number, at the page's small text size minus one step (12 px). */
export const tickFont = '12px "JetBrains Mono Variable", ui-monospace, monospace';

/** Axis labels in the text face at 13 px. */
export const axisLabelFont = '13px "Inter Variable", ui-sans-serif, system-ui, sans-serif';

/** Legends under a chart: the page's small text (text-sm, 14 px), never smaller. */
export const legendClass = 'mt-1 flex flex-wrap justify-center gap-x-4 gap-y-1 text-sm text-ink-soft';
