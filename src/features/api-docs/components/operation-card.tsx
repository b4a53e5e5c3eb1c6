import type { AuthNeed, OpenApiDoc, Operation, Parameter } from '../openapi-types.ts';
import { bodyVariants, describeSchema, type FieldRow } from './schema-rows.ts';
import { CodeBlock } from './code-block.tsx';
import { MethodBadge } from './method-badge.tsx';

const authWords: Record<AuthNeed, string> = {
  visitor: 'Anyone, signed in or not',
  session: 'Signed-in browser (session cookie; X-CSRF-Token on writes)',
  'session-or-token': 'Signed-in browser or rig token',
};

function scopeOf(op: Operation): string | null {
  const bearer = op.security.find((s) => 'bearerToken' in s)?.bearerToken;
  return bearer && bearer.length > 0 ? bearer.join(', ') : null;
}

function FieldTable({ rows, caption }: { rows: FieldRow[]; caption: string }) {
  if (rows.length === 0) return <p className="text-sm text-ink-soft">No fields.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-rule text-xs text-ink-soft">
            <th scope="col" className="py-1 pr-3 font-medium">
              Field
            </th>
            <th scope="col" className="py-1 pr-3 font-medium">
              Type
            </th>
            <th scope="col" className="py-1 font-medium">
              Notes
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.name} className="border-b border-rule/60 align-top">
              <td className="py-1 pr-3 font-mono text-xs">
                {r.name}
                {r.required && <span className="ml-1 font-sans text-copper-dark">required</span>}
              </td>
              <td className="py-1 pr-3 font-mono text-xs text-ink-soft">{r.type}</td>
              <td className="py-1 text-xs">{r.notes.join('; ')}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function resolve(p: Parameter, doc: OpenApiDoc): Parameter {
  return p.$ref ? (doc.components.parameters[p.$ref.split('/').pop()!] ?? p) : p;
}

/** One operation: method and path, summary, who may call it, parameters, body fields and the example. */
export function OperationCard({ method, path, op, doc }: { method: string; path: string; op: Operation; doc: OpenApiDoc }) {
  const params = (op.parameters ?? []).map((p) => resolve(p, doc));
  const media = op.requestBody ? Object.entries(op.requestBody.content)[0] : undefined;
  const variants = media ? bodyVariants(media[1].schema) : [];
  const scope = scopeOf(op);
  const ok = Object.entries(op.responses).find(([s]) => Number(s) < 400);
  const errors = Object.keys(op.responses).filter((s) => Number(s) >= 400);
  return (
    <article id={op.operationId} className="scroll-mt-20 rounded-lg border border-rule bg-white p-4">
      <header className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <MethodBadge method={method.toUpperCase()} />
        <code className="break-all font-mono text-sm font-semibold">{path}</code>
      </header>
      <h3 className="mt-2 font-medium">{op.summary}</h3>
      {op.description && (
        <p className="mt-1 text-sm text-ink-soft">
          {op.description.split('`').map((part, i) =>
            i % 2 === 1 ? (
              <code key={i} className="font-mono text-xs text-ink">
                {part}
              </code>
            ) : (
              part
            ),
          )}
        </p>
      )}
      <dl className="mt-3 grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[8rem_1fr]">
        <dt className="text-ink-soft">Who</dt>
        <dd>
          {authWords[op['x-scanwright-auth']]}
          {scope && <span className="ml-1 text-ink-soft">(token scope {scope})</span>}
        </dd>
        {ok && (
          <>
            <dt className="text-ink-soft">Answer</dt>
            <dd>
              <span className="font-mono text-xs">{ok[0]}</span> {ok[1].description}
              {errors.length > 0 && <span className="text-ink-soft"> · errors {errors.join(', ')}</span>}
            </dd>
          </>
        )}
      </dl>
      {params.length > 0 && (
        <section className="mt-3">
          <h4 className="text-sm font-semibold">Parameters</h4>
          <FieldTable
            caption={`Parameters of ${method.toUpperCase()} ${path}`}
            rows={params.map((p) => {
              const d = describeSchema(p.schema);
              return {
                name: `${p.name ?? ''} (${p.in ?? ''})`,
                type: d.type,
                required: p.required === true,
                notes: [...(p.description ? [p.description] : []), ...d.notes],
              };
            })}
          />
        </section>
      )}
      {media && (
        <section className="mt-3 space-y-2">
          <h4 className="text-sm font-semibold">
            Body <span className="font-mono text-xs font-normal text-ink-soft">{media[0]}</span>
          </h4>
          {variants.map((v, i) => (
            // Variants of a union body may share a label (or have none): the position keeps keys unique.
            <div key={`${i}-${v.label ?? 'body'}`}>
              {v.label && <p className="mb-1 font-mono text-xs text-teal-dark">{v.label}</p>}
              <FieldTable rows={v.rows} caption={`Body fields of ${method.toUpperCase()} ${path}${v.label ? `, ${v.label}` : ''}`} />
            </div>
          ))}
          {media[1].example !== undefined && <CodeBlock label="Example body" code={JSON.stringify(media[1].example, null, 2)} />}
        </section>
      )}
    </article>
  );
}
