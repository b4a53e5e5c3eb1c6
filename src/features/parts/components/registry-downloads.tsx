import { DATA_LICENCE } from '@shared/data-licence.ts';

const BASE = '/api/registry/dataset';
const FILES = [
  { file: 'parts.csv', what: 'every listed part with its pooled figures' },
  { file: 'runs.csv', what: 'every accepted run with its fitted figures' },
  { file: 'points.csv', what: 'the raw points and samples of those runs' },
  { file: 'dataset.json', what: 'parts and runs in one JSON file' },
  { file: 'README.md', what: 'what each column means, units and rounding' },
] as const;

/** "Download the registry": the whole-registry dataset's files and the licence they are under. */
export function RegistryDownloads() {
  return (
    <section aria-labelledby="registry-download-title" className="mt-8 rounded-lg border border-rule bg-white p-4">
      <h2 id="registry-download-title" className="font-semibold">
        Download the registry
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        Accepted measurements only, figures rounded as these pages show them. Published under{' '}
        <a href={DATA_LICENCE.url} rel="license noreferrer" target="_blank" className="text-copper-dark underline">
          {DATA_LICENCE.name}
        </a>
        : use them freely, crediting “{DATA_LICENCE.attribution}”.
      </p>
      <ul className="mt-3 grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
        {FILES.map((f) => (
          <li key={f.file}>
            <a href={`${BASE}/${f.file}`} className="font-mono text-copper-dark underline">
              {f.file}
            </a>{' '}
            <span className="text-ink-soft">— {f.what}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
