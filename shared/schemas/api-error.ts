import { z } from 'zod';

/** The one shape every error answer of the API has (server/middleware/error-handler.ts). */
export const apiErrorBody = z.object({
  error: z.object({
    code: z.string().meta({ description: 'A stable machine-readable code, e.g. `validation_failed`, `invalid_token`.' }),
    message: z.string().meta({ description: 'A sentence for people.' }),
    details: z.unknown().optional().meta({ description: 'For `validation_failed`: the fields at fault, `[{ path, message }]`.' }),
  }),
});
