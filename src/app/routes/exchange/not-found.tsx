import { NotFound } from '@/components/ui/load-states.tsx';

/** A listing or conversation that is gone, hidden or was never there. */
export function ExchangeNotFound({ what, back, backLabel }: { what: string; back: string; backLabel: string }) {
  return (
    <NotFound
      title={`No such ${what}`}
      reason="It may have been closed, hidden by a moderator, or the link is wrong."
      links={[{ to: back, label: backLabel }]}
    />
  );
}
