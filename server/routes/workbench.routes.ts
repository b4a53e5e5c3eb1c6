import { Router } from 'express';
import type { z } from 'zod';
import { calculators } from '@shared/workbench/calculators/all-calculators.ts';
import type { Calculator, ResultNotes } from '@shared/workbench/calculators/calculator.ts';
import { asBadRequest } from '../services/workbench.service.ts';
import { decodeHeightImage } from '../services/image-heights.service.ts';
import { receiveImage, uploadedImage } from '../middleware/receive-image.ts';
import { route } from './route.ts';

/** Pure calculations, one route per shared calculator, and image decoding for them; no sign-in, nothing stored. */
export function workbenchRoutes(): Router {
  const r = Router();
  // A PNG or TIFF height image as rows of numbers, for the lattice analysis (the page reads PNGs itself).
  r.post(
    '/api/workbench/image-heights',
    receiveImage(),
    route({}, async ({ req, res }) => {
      res.json(await decodeHeightImage(uploadedImage(req)));
    }),
  );
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
