import { lazy } from 'react';

// The editor's forms that open on a click load then: the editor's first load carries only what it shows.

/** The calibration-run form (CSV parsing, the live fit), fetched when a maker adds or corrects a run of points. */
export const LazyRunForm = lazy(() => import('./run-form.tsx').then((m) => ({ default: m.RunForm })));

/** The details form of a stored run of another kind, fetched when a maker corrects one. */
export const LazyRunDetailsForm = lazy(() => import('./run-details-form.tsx').then((m) => ({ default: m.RunDetailsForm })));

/** The actuator form (part picker, geometry), fetched when a maker adds or edits an actuator. */
export const LazyActuatorForm = lazy(() => import('./actuator-form.tsx').then((m) => ({ default: m.ActuatorForm })));
