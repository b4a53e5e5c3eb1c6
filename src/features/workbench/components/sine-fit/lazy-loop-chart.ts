import { lazy } from 'react';

/** The loop chart in its own chunk, so recharts stays out of the page's first load. */
export const LazyLoopChart = lazy(() => import('./loop-chart.tsx').then((m) => ({ default: m.LoopChart })));
