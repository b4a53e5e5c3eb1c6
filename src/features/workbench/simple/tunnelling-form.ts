import { tunnellingInput } from '@shared/schemas/workbench.ts';

/** The tunnelling page's form is the shared input itself (barrier height, optional wanted ratio). */
export const tunnellingForm = tunnellingInput;
