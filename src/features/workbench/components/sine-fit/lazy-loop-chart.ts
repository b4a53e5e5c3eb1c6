import { lazy } from 'react';

/** The loop chart in its own chunk, so the chart library stays out of the page's first load. */
export const LazyLoopChart = lazy(() => import('./loop-chart.tsx').then((m) => ({ default: m.LoopChart })));
