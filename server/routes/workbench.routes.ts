import { Router } from 'express';
import type { z } from 'zod';
import { calculators } from '@shared/workbench/calculators/all-calculators.ts';
import type { Calculator, ResultNotes } from '@shared/workbench/calculators/calculator.ts';
import { asBadRequest } from '../services/workbench.service.ts';
import { route } from './route.ts';

/** Pure calculations, one route per shared calculator; no sign-in, nothing stored. */
export function workbenchRoutes(): Router {
  const r = Router();
  for (const c of calculators as readonly Calculator<z.ZodType, ResultNotes>[]) {
    r.post(
      `/api/workbench/${c.slug}`,
      route({ body: c.input }, ({ body, res }) => {
        res.json(asBadRequest(() => c.compute(body)));
      }),
    );
  }
  return r;
}
