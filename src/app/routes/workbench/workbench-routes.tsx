import type { RouteObject } from 'react-router-dom';
import { lazyPage } from '../../lazy-page.tsx';
import { WorkbenchOutlet } from './workbench-outlet.tsx';

/** The workbench section: an index of calculators, one lazily loaded page each. */
export const workbenchRoutes: RouteObject = {
  path: 'workbench',
  element: <WorkbenchOutlet />,
  children: [
    {
      index: true,
      element: lazyPage(
        () => import('./workbench-index.tsx'),
        (m) => m.WorkbenchIndexPage,
      ),
    },
    {
      path: 'fit',
      element: lazyPage(
        () => import('./fit.tsx'),
        (m) => m.FitPage,
      ),
    },
    {
      path: 'peak-to-peak',
      element: lazyPage(
        () => import('./peak-to-peak.tsx'),
        (m) => m.PeakToPeakPage,
      ),
    },
    {
      path: 'sine-fit',
      element: lazyPage(
        () => import('./sine-fit.tsx'),
        (m) => m.SineFitPage,
      ),
    },
    {
      path: 'linearise',
      element: lazyPage(
        () => import('./linearise.tsx'),
        (m) => m.LinearisePage,
      ),
    },
    {
      path: 'lattice',
      element: lazyPage(
        () => import('./lattice.tsx'),
        (m) => m.LatticePage,
      ),
    },
    {
      path: 'creep',
      element: lazyPage(
        () => import('./creep.tsx'),
        (m) => m.CreepPage,
      ),
    },
    {
      path: 'expected-gain',
      element: lazyPage(
        () => import('./expected-gain.tsx'),
        (m) => m.ExpectedGainPage,
      ),
    },
    {
      path: 'mixing',
      element: lazyPage(
        () => import('./mixing.tsx'),
        (m) => m.MixingPage,
      ),
    },
    {
      path: 'scan-planner',
      element: lazyPage(
        () => import('./scan-planner.tsx'),
        (m) => m.ScanPlannerPage,
      ),
    },
    {
      path: 'resonance',
      element: lazyPage(
        () => import('./resonance.tsx'),
        (m) => m.ResonancePage,
      ),
    },
    {
      path: 'drive-current',
      element: lazyPage(
        () => import('./drive-current.tsx'),
        (m) => m.DriveCurrentPage,
      ),
    },
    {
      path: 'tunnelling',
      element: lazyPage(
        () => import('./tunnelling.tsx'),
        (m) => m.TunnellingPage,
      ),
    },
    {
      path: 'units',
      element: lazyPage(
        () => import('./units.tsx'),
        (m) => m.UnitsPage,
      ),
    },
    {
      path: 'loaded-gain',
      element: lazyPage(
        () => import('./loaded-gain.tsx'),
        (m) => m.LoadedGainPage,
      ),
    },
    {
      path: 'tube',
      element: lazyPage(
        () => import('./tube.tsx'),
        (m) => m.TubePage,
      ),
    },
    {
      path: 'drive-limits',
      element: lazyPage(
        () => import('./drive-limits.tsx'),
        (m) => m.DriveLimitsPage,
      ),
    },
    {
      path: 'noise-floor',
      element: lazyPage(
        () => import('./noise-floor.tsx'),
        (m) => m.NoiseFloorPage,
      ),
    },
  ],
};
