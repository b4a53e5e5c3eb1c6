// The chart components, each loaded on first use so the chart library (uPlot) stays out of the entry chunk.
import { lazy } from 'react';

/** Calibration scatter with the fit line (the app-wide chart in components/charts). */
export const LazyCalibrationChart = lazy(() =>
  import('@/components/charts/calibration-chart.tsx').then((m) => ({ default: m.CalibrationChart })),
);

/** Reachable parallelogram of a two-axis mixer (charts/mixer-chart.tsx). */
export const LazyMixerChart = lazy(() => import('./mixer-chart.tsx').then((m) => ({ default: m.MixerChart })));

/** LSB step against DAC bits (charts/scan-chart.tsx). */
export const LazyScanChart = lazy(() => import('./scan-chart.tsx').then((m) => ({ default: m.ScanChart })));

/** Creep record with the fitted logarithmic law (charts/creep-chart.tsx). */
export const LazyCreepChart = lazy(() => import('./creep-chart.tsx').then((m) => ({ default: m.CreepChart })));
