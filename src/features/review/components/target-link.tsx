import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';
import { useReviewRun } from '@/features/review/api/get-review-run.ts';

const linkClass = 'text-copper underline';

/** A link to the page of a reported or audited thing; runs are looked up to find their build. */
export function TargetLink({ type, id, children }: { type: string; id: number; children: ReactNode }) {
  if (type === 'build')
    return (
      <Link className={linkClass} to={paths.build(id)}>
        {children}
      </Link>
    );
  if (type === 'part')
    return (
      <Link className={linkClass} to={paths.part(id)}>
        {children}
      </Link>
    );
  if (type === 'run') return <RunLink id={id}>{children}</RunLink>;
  if (type === 'listing')
    return (
      <Link className={linkClass} to={paths.exchange}>
        {children}
      </Link>
    );
  return <>{children}</>;
}

function RunLink({ id, children }: { id: number; children: ReactNode }) {
  const run = useReviewRun(id);
  if (!run.data) return <>{children}</>;
  return (
    <Link className={linkClass} to={paths.build(run.data.buildId)} title="Open the build this run belongs to">
      {children}
    </Link>
  );
}
