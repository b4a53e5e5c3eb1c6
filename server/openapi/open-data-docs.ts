// Route table rows (route-docs.ts): the registry dataset files.
import type { RouteDoc } from './route-doc.ts';

const datasetFile = (file: string, summary: string, contentType: string): RouteDoc => ({
  method: 'GET',
  path: `/api/registry/dataset/${file}`,
  summary,
  description: 'Public, the same for everyone, cacheable for five minutes. Only listed parts and accepted runs of published builds.',
  tag: 'Open data',
  auth: 'visitor',
  response: { status: 200, description: `${file} of the registry dataset.`, contentType },
});

/** The registry dataset files. */
export const openDataDocs: readonly RouteDoc[] = [
  datasetFile('README.md', 'What each dataset file and column holds, the licence and how to credit', 'text/markdown'),
  datasetFile('parts.csv', 'Listed parts with their pooled figures', 'text/csv'),
  datasetFile('runs.csv', 'Accepted runs with their figures, rounded as the pages show them', 'text/csv'),
  datasetFile('points.csv', "Every accepted run's raw points, samples or readings (long format)", 'text/csv'),
  datasetFile('dataset.json', 'Parts and runs with figures and the licence, as JSON', 'application/json'),
];
