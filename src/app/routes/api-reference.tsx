import { PageHeader } from '@/components/ui/page-header.tsx';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { useOpenApi } from '@/features/api-docs/api/get-openapi.ts';
import { HTTP_METHODS, type OpenApiDoc, type Operation } from '@/features/api-docs/openapi-types.ts';
import { OperationCard } from '@/features/api-docs/components/operation-card.tsx';
import { RigQuickstart } from '@/features/api-docs/components/rig-quickstart.tsx';

interface Entry {
  method: string;
  path: string;
  op: Operation;
}

function byTag(doc: OpenApiDoc): Array<{ name: string; description: string; entries: Entry[] }> {
  const entries = Object.entries(doc.paths).flatMap(([path, ops]) =>
    HTTP_METHODS.filter((m) => ops[m]).map((method) => ({ method, path, op: ops[method]! })),
  );
  return doc.tags
    .map((tag) => ({ ...tag, entries: entries.filter((e) => e.op.tags.includes(tag.name)) }))
    .filter((g) => g.entries.length > 0);
}

const slug = (s: string) => s.toLowerCase().replace(/[^a-z0-9]+/g, '-');

/** /api-reference: the API as its OpenAPI document describes it, grouped by tag, with the rig quick start first. */
export function ApiReferencePage() {
  const doc = useOpenApi();
  const origin = window.location.origin;
  return (
    <div>
      <PageHeader
        title="API reference"
        lead={
          <>
            Everything the pages do goes through this JSON API. The machine-readable description is{' '}
            <a href="/api/openapi.json" className="text-copper-dark underline">
              /api/openapi.json
            </a>{' '}
            (OpenAPI 3.1).
          </>
        }
      />
      <div className="space-y-8">
        <RigQuickstart origin={origin} />
        {doc.isPending ? (
          <Loading>Loading the API description…</Loading>
        ) : doc.isError ? (
          <LoadError what="the API description" error={doc.error} onRetry={() => void doc.refetch()} />
        ) : (
          <ReferenceBody doc={doc.data} />
        )}
      </div>
    </div>
  );
}

function ReferenceBody({ doc }: { doc: OpenApiDoc }) {
  const groups = byTag(doc);
  return (
    <>
      <section aria-labelledby="conventions-title" className="rounded-lg border border-rule bg-white p-4 text-sm">
        <h2 id="conventions-title" className="text-lg font-semibold">
          Conventions
        </h2>
        <ul className="mt-2 list-disc space-y-1 pl-5">
          <li>JSON in and out; numbers in the units each field names (SI or a suffix such as Nm, V, Hz).</li>
          <li>
            Errors are always <code className="font-mono">{'{ "error": { "code", "message", "details?" } }'}</code>; the code is stable, the
            message is for people.
          </li>
          <li>
            Browsers send the <code className="font-mono">csrfToken</code> of <code className="font-mono">GET /api/session</code> as{' '}
            <code className="font-mono">X-CSRF-Token</code> on writes; rig tokens need neither cookie nor CSRF token.
          </li>
        </ul>
        <nav aria-label="API sections" className="mt-3 flex flex-wrap gap-2">
          {groups.map((g) => (
            <a key={g.name} href={`#${slug(g.name)}`} className="rounded-full border border-rule px-2.5 py-0.5 text-xs hover:border-copper">
              {g.name} <span className="text-ink-soft">{g.entries.length}</span>
            </a>
          ))}
        </nav>
      </section>
      {groups.map((g) => (
        <section key={g.name} id={slug(g.name)} aria-labelledby={`${slug(g.name)}-title`} className="scroll-mt-20 space-y-3">
          <div className="border-b border-rule pb-1">
            <h2 id={`${slug(g.name)}-title`} className="text-xl font-semibold">
              {g.name}
            </h2>
            <p className="text-sm text-ink-soft">{g.description}</p>
          </div>
          {g.entries.map((e) => (
            <OperationCard key={`${e.method} ${e.path}`} method={e.method} path={e.path} op={e.op} doc={doc} />
          ))}
        </section>
      ))}
    </>
  );
}
