// Shift-drag pans a zoomable chart along x: uPlot's own drag selects a range to zoom into, so a shift-press is caught
// first (capture phase on the chart's root) and moves the x scale by the distance dragged, in log space on a log axis.
import type uPlot from 'uplot';

/** Installs the pan handler on a chart; returns the function that removes it. */
export function installShiftPan(u: uPlot, log: boolean): () => void {
  const root = u.root;
  const onDown = (e: MouseEvent) => {
    if (!e.shiftKey || e.button !== 0 || !u.over.contains(e.target as Node)) return;
    e.preventDefault();
    e.stopPropagation();
    const { min, max } = u.scales.x;
    if (min == null || max == null) return;
    const width = u.over.getBoundingClientRect().width || 1;
    const startX = e.clientX;
    const [a, b] = log ? [Math.log10(min), Math.log10(max)] : [min, max];
    const onMove = (m: MouseEvent) => {
      const shift = ((m.clientX - startX) / width) * (b - a);
      const [lo, hi] = [a - shift, b - shift];
      u.setScale('x', log ? { min: 10 ** lo, max: 10 ** hi } : { min: lo, max: hi });
    };
    const onUp = () => {
      window.removeEventListener('mousemove', onMove);
      window.removeEventListener('mouseup', onUp);
    };
    window.addEventListener('mousemove', onMove);
    window.addEventListener('mouseup', onUp);
  };
  root.addEventListener('mousedown', onDown, true);
  return () => root.removeEventListener('mousedown', onDown, true);
}
