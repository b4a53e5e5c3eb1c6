import { useQuery } from '@tanstack/react-query';
import type { FollowTargetType } from '@shared/schemas/follow.ts';
import { Button } from '@/components/ui/button.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';
import { followQueries, useSetFollow } from '@/lib/follow-queries.ts';

const what: Record<FollowTargetType, string> = {
  build: 'new log entries on this build',
  part: 'runs that newly count for this part',
  maker: 'new builds by this maker',
};

/**
 * "Follow" / "Following ✓" for a build, a part or a maker, with how many follow it. Visitors see nothing
 * (the sign-in link elsewhere on the page serves them).
 */
export function FollowButton({ type, id, signedIn, label }: { type: FollowTargetType; id: number; signedIn: boolean; label?: string }) {
  const state = useQuery({ ...followQueries.state(type, id), enabled: signedIn });
  const set = useSetFollow(type, id);
  if (!signedIn || !state.data) return null;
  const following = set.isPending ? !state.data.following : state.data.following;
  const name = label ?? (type === 'build' ? 'this build' : type === 'part' ? 'this part' : 'this maker');
  return (
    <span className="inline-flex flex-wrap items-center gap-2 text-sm">
      <Button
        variant="secondary"
        aria-pressed={following}
        title={`Tell me about ${what[type]} (notifications, and mail if you keep it on)`}
        disabled={set.isPending}
        onClick={() => set.mutate(!state.data.following)}
      >
        {following ? `Following ${name}` : `Follow ${name}`}
      </Button>
      <span className="text-ink-soft">
        <span className="num">{state.data.followers}</span> {state.data.followers === 1 ? 'follower' : 'followers'}
      </span>
      {set.isError && (
        <span role="alert" className="text-danger">
          {errorMessage(set.error)}
        </span>
      )}
    </span>
  );
}
