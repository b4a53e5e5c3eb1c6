import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import type { FollowDto } from '@shared/schemas/follow.ts';
import { Button } from '@/components/ui/button.tsx';
import { followQueries, useSetFollow } from '@/lib/follow-queries.ts';

const typeWords = { build: 'Build', part: 'Part', maker: 'Maker' } as const;

function Row({ f }: { f: FollowDto }) {
  const set = useSetFollow(f.targetType, f.targetId);
  return (
    <li className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-rule px-3 py-2 text-sm">
      <span className="w-16 text-xs font-medium uppercase tracking-wide text-teal-dark">{typeWords[f.targetType]}</span>
      <Link className="min-w-0 flex-1 text-copper underline" to={f.path}>
        {f.label}
      </Link>
      <Button variant="ghost" disabled={set.isPending} onClick={() => set.mutate(false)}>
        Stop following <span className="sr-only">{f.label}</span>
      </Button>
    </li>
  );
}

/** What I follow, each with "Stop following". */
export function FollowingList() {
  const follows = useQuery(followQueries.mine());
  const items = follows.data?.items ?? [];
  return (
    <section aria-labelledby="following-title" className="space-y-2">
      <h2 id="following-title" className="text-lg font-semibold">
        What you follow
      </h2>
      {follows.isPending ? (
        <p role="status" className="text-sm text-ink-soft">
          Loading…
        </p>
      ) : items.length === 0 ? (
        <p className="text-sm text-ink-soft">
          Nothing yet. Follow a build, a part or a maker from its page to hear of new log entries, newly counted runs and new builds.
        </p>
      ) : (
        <ul className="rounded-lg border border-rule bg-white">
          {items.map((f) => (
            <Row key={`${f.targetType}-${f.targetId}`} f={f} />
          ))}
        </ul>
      )}
    </section>
  );
}
