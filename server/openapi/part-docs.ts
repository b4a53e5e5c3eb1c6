// Route table rows (route-docs.ts): the parts registry and its photos.
import { partPhotoParams } from '@shared/schemas/attached-photo.ts';
import { listPartsQuery, mergePartInput, partIdParams, proposePartInput } from '@shared/schemas/part.ts';
import { attachedPhotoDocs, json, type RouteDoc } from './route-doc.ts';

/** The parts registry and its photos. */
export const partDocs: readonly RouteDoc[] = [
  {
    method: 'GET',
    path: '/api/parts',
    summary: 'Search the parts registry',
    description: '`format=csv` or `format=json` (or `Accept: text/csv`) downloads the whole search.',
    tag: 'Parts registry',
    auth: 'visitor',
    query: listPartsQuery,
    response: json(200, 'A page of parts with pooled figures.'),
  },
  {
    method: 'GET',
    path: '/api/parts/histogram',
    summary: 'Histogram of listed parts by median gain',
    tag: 'Parts registry',
    auth: 'visitor',
    response: json(200, 'Log-spaced bins.'),
  },
  {
    method: 'POST',
    path: '/api/parts',
    summary: 'Propose a part for the registry',
    tag: 'Parts registry',
    auth: 'session',
    body: proposePartInput,
    idempotent: true,
    response: json(201, '`{ id, status }`.'),
    example: {
      category: 'buzzer-disc',
      name: '27 mm brass buzzer disc',
      salvageSource: 'smoke alarm',
      material: 'PZT',
      outerDiameterMm: 27,
    },
  },
  {
    method: 'GET',
    path: '/api/parts/:partId',
    summary: 'A part with its accepted runs and listings',
    tag: 'Parts registry',
    auth: 'visitor',
    params: partIdParams,
    response: json(200, 'The part.'),
  },
  {
    method: 'POST',
    path: '/api/parts/:partId/merge',
    summary: 'Merge a duplicate part into another (moderators)',
    tag: 'Parts registry',
    auth: 'session',
    params: partIdParams,
    body: mergePartInput,
    response: json(200, 'The merge.'),
  },
  ...attachedPhotoDocs('/api/parts', 'partId', 'Parts registry', 'part', partIdParams, partPhotoParams),
];
