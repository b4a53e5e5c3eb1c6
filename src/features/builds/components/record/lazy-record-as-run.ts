import { lazy } from 'react';

/** The "Record as a run" form, fetched when a maker opens it. */
export const LazyRecordAsRun = lazy(() => import('./record-as-run.tsx').then((m) => ({ default: m.RecordAsRun })));
