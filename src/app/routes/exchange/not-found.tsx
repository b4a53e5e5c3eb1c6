import { Link } from 'react-router-dom';

/** A listing or conversation that is gone, hidden or was never there. */
export function ExchangeNotFound({ what, back, backLabel }: { what: string; back: string; backLabel: string }) {
  return (
    <div className="mx-auto max-w-xl py-12 text-center">
      <h1 className="text-xl font-semibold">No such {what}</h1>
      <p className="mt-2 text-ink-soft">It may have been closed, hidden by a moderator, or the link is wrong.</p>
      <p className="mt-4">
        <Link to={back} className="text-copper-dark underline">
          {backLabel}
        </Link>
      </p>
    </div>
  );
}
