// Kept apart from the URL-inputs hook so the workbench outlet (in the main bundle) imports nothing heavy.

/** History state on the entries the form writes, so the workbench outlet tells them from real navigation. */
export const URL_INPUTS_STATE = { urlInputs: true } as const;

/** Whether a location was written by a form following its inputs (not a link, a picker or back/forward). */
export const isInputsWrite = (state: unknown) => typeof state === 'object' && state !== null && 'urlInputs' in state;
