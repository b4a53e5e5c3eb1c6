import type { RouteObject } from 'react-router-dom';
import { WorkbenchOutlet } from './workbench-outlet.tsx';

/** The workbench section: an index of calculators, one lazily loaded page each. */
export const workbenchRoutes: RouteObject = {
  path: 'workbench',
  Component: WorkbenchOutlet,
  children: [
    { index: true, lazy: async () => ({ Component: (await import('./workbench-index.tsx')).WorkbenchIndexPage }) },
    { path: 'fit', lazy: async () => ({ Component: (await import('./fit.tsx')).FitPage }) },
    { path: 'peak-to-peak', lazy: async () => ({ Component: (await import('./peak-to-peak.tsx')).PeakToPeakPage }) },
    { path: 'sine-fit', lazy: async () => ({ Component: (await import('./sine-fit.tsx')).SineFitPage }) },
    { path: 'linearise', lazy: async () => ({ Component: (await import('./linearise.tsx')).LinearisePage }) },
    { path: 'lattice', lazy: async () => ({ Component: (await import('./lattice.tsx')).LatticePage }) },
    { path: 'creep', lazy: async () => ({ Component: (await import('./creep.tsx')).CreepPage }) },
    { path: 'expected-gain', lazy: async () => ({ Component: (await import('./expected-gain.tsx')).ExpectedGainPage }) },
    { path: 'mixing', lazy: async () => ({ Component: (await import('./mixing.tsx')).MixingPage }) },
    { path: 'scan-planner', lazy: async () => ({ Component: (await import('./scan-planner.tsx')).ScanPlannerPage }) },
    { path: 'resonance', lazy: async () => ({ Component: (await import('./resonance.tsx')).ResonancePage }) },
    { path: 'drive-current', lazy: async () => ({ Component: (await import('./drive-current.tsx')).DriveCurrentPage }) },
    { path: 'tunnelling', lazy: async () => ({ Component: (await import('./tunnelling.tsx')).TunnellingPage }) },
    { path: 'units', lazy: async () => ({ Component: (await import('./units.tsx')).UnitsPage }) },
    { path: 'loaded-gain', lazy: async () => ({ Component: (await import('./loaded-gain.tsx')).LoadedGainPage }) },
    { path: 'tube', lazy: async () => ({ Component: (await import('./tube.tsx')).TubePage }) },
    { path: 'drive-limits', lazy: async () => ({ Component: (await import('./drive-limits.tsx')).DriveLimitsPage }) },
    { path: 'noise-floor', lazy: async () => ({ Component: (await import('./noise-floor.tsx')).NoiseFloorPage }) },
  ],
};
