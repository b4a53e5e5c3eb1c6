import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';

export function NotFoundPage() {
  return (
    <div className="mx-auto max-w-xl py-16 text-center">
      <p className="num text-5xl text-copper">404</p>
      <h1 className="mt-2 text-xl font-semibold">No page at this address</h1>
      <p className="mt-2 text-ink-soft">The link may be old, or the page was moved.</p>
      <p className="mt-6">
        <Link className="text-copper underline" to={paths.home}>
          Back to the start page
        </Link>
      </p>
    </div>
  );
}
