import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { toolTitle, type WorkbenchSlug } from '../tools.ts';
import { CopyLinkButton } from './copy-link-button.tsx';

/**
 * Frame of every calculator: breadcrumb back to the workbench, title, one line of purpose, and a button copying
 * the link to the result (the inputs live in the URL; `linkNote` says what the link leaves out).
 */
export function ToolPage({
  slug,
  lead,
  linkNote,
  children,
}: {
  slug: WorkbenchSlug;
  lead: ReactNode;
  linkNote?: string;
  children: ReactNode;
}) {
  const title = toolTitle(slug);
  return (
    <div>
      <nav aria-label="Breadcrumb" className="mb-2 text-sm">
        <ol className="flex flex-wrap gap-1 text-ink-soft">
          <li>
            <Link to={paths.workbench} className="text-teal-dark underline-offset-2 hover:underline">
              Workbench
            </Link>
          </li>
          <li aria-hidden="true">›</li>
          <li aria-current="page" className="text-ink">
            {title}
          </li>
        </ol>
      </nav>
      <PageHeader title={title} lead={lead} />
      <div className="mb-4">
        <CopyLinkButton note={linkNote} />
      </div>
      {children}
    </div>
  );
}

/** Inputs on the left, results on the right; stacked on phones. */
export function ToolColumns({ inputs, results }: { inputs: ReactNode; results: ReactNode }) {
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <div className="min-w-0 space-y-4">{inputs}</div>
      <div className="min-w-0 space-y-4 lg:sticky lg:top-4">{results}</div>
    </div>
  );
}
