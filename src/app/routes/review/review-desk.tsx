import { Loading } from '@/components/ui/load-states.tsx';
import { useSearchParams } from 'react-router-dom';
import { can } from '@shared/policies.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { toActor } from '@/features/session/to-actor.ts';
import { useReviewQueue } from '@/features/review/api/get-review-queue.ts';
import { ModeratorsOnly } from '@/features/review/components/moderators-only.tsx';
import { ReviewDesk } from '@/features/review/components/desk/review-desk.tsx';
import { firstBusyKind, isQueueKind, type QueueKind } from '@/features/review/components/desk/queue-model.ts';

const TITLE = 'Review desk';
const lead =
  'Builds, calibration runs, proposed parts and reports waiting for a moderator, oldest first. Nothing counts until it is decided here.';

/** /review?queue=runs&item=12: the queue and the selected item live in the URL, so a link opens the same item. */
export function ReviewDeskPage() {
  const { data: session } = useSession();
  const allowed = can(toActor(session?.user ?? null), 'review.access');
  const queue = useReviewQueue(allowed);
  const [params, setParams] = useSearchParams();

  if (!allowed) return <ModeratorsOnly title={TITLE} signedIn={Boolean(session?.user)} returnTo={paths.review} />;

  const header = (
    <PageHeader
      title={TITLE}
      lead={lead}
      actions={
        <LinkButton variant="secondary" to={paths.reviewAudit}>
          Audit trail
        </LinkButton>
      }
    />
  );
  if (queue.isPending)
    return (
      <div>
        {header}
        <Loading>Loading the queues…</Loading>
      </div>
    );
  if (queue.isError) {
    return (
      <div>
        {header}
        <p role="alert" className="text-danger">
          The queues did not load: {queue.error.message}
        </p>
      </div>
    );
  }

  const requested = params.get('queue');
  const kind = isQueueKind(requested) ? requested : firstBusyKind(queue.data);
  const item = Number(params.get('item'));
  const handleChange = (next: { kind: QueueKind; id: number | null }) =>
    setParams(next.id === null ? { queue: next.kind } : { queue: next.kind, item: String(next.id) }, { replace: true });

  return (
    <div>
      {header}
      <ReviewDesk queue={queue.data} kind={kind} requestedId={Number.isInteger(item) && item > 0 ? item : null} onChange={handleChange} />
    </div>
  );
}
