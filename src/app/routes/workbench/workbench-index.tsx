import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { workbenchTools } from '@/features/workbench/tools.ts';

export function WorkbenchIndexPage() {
  return (
    <div>
      <PageHeader
        title="Workbench"
        lead="The numbers a scanning probe build runs on. Everything is computed in your browser as you type; nothing is saved, no sign-in needed."
      />
      <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {workbenchTools.map((tool) => (
          <li key={tool.slug}>
            <Link
              to={paths.workbenchTool(tool.slug)}
              className="block h-full rounded-lg border border-rule bg-white p-4 hover:border-copper"
            >
              <h2 className="font-semibold">{tool.title}</h2>
              <p className="mt-1 text-sm text-ink-soft">{tool.line}</p>
            </Link>
          </li>
        ))}
      </ul>
      <p className="mt-6 text-sm text-ink-soft">
        Each result names the formula and source it rests on. Free, unloaded figures are upper bounds for salvaged parts: always measure.
      </p>
      <p className="mt-2 text-sm text-ink-soft">
        Every calculator is also an API route (<code className="font-mono">POST /api/workbench/…</code>), open to scripts without sign-in:
        see the{' '}
        <Link to={paths.apiReference} className="text-copper-dark underline">
          API reference
        </Link>
        .
      </p>
    </div>
  );
}
