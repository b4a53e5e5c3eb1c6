import { useQuery } from '@tanstack/react-query';
import type { ReviewThreadItemDto } from '@shared/schemas/review-thread.ts';
import { MAX_REVIEW_POST_CHARS } from '@shared/schemas/post-limits.ts';
import { formatDate } from '@shared/format/dates.ts';
import { Markdown } from '@/components/ui/markdown.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';
import { MarkdownPostForm } from '@/components/ui/markdown-post-form.tsx';
import { ApiError } from '@/lib/api-client.ts';
import { reviewThreadQuery, usePostToReviewThread } from '@/lib/review-thread-queries.ts';

const failure = (e: unknown) =>
  e instanceof ApiError && e.status === 429 ? 'Many posts in a short time; try again in a few minutes.' : errorMessage(e);

function Item({ item }: { item: ReviewThreadItemDto }) {
  if (item.type === 'decision')
    return (
      <li className="border-l-4 border-copper bg-paper-deep/60 px-3 py-2 text-sm">
        <p>
          <span className="font-semibold">{item.label}</span> by {item.by ?? 'a moderator'} ·{' '}
          <span className="num">{formatDate(item.createdAt)}</span>
        </p>
        {item.note && <p className="mt-1 whitespace-pre-line">{item.note}</p>}
      </li>
    );
  const maker = item.side === 'maker';
  return (
    <li className={`rounded-lg border p-3 ${maker ? 'border-rule bg-white' : 'border-teal/50 bg-teal/5 sm:ml-8'}`}>
      <p className="mb-1 text-xs text-ink-soft">
        <span className="font-medium text-ink">{item.author.login}</span> ({maker ? 'maker' : 'moderator'}) ·{' '}
        <span className="num">{formatDate(item.createdAt)}</span>
      </p>
      <Markdown className="max-w-3xl text-sm [&>:first-child]:mt-0!">{item.body}</Markdown>
    </li>
  );
}

/**
 * The review thread of a build: its maker and the moderators talk about the review, with the desk's decisions
 * in between. Shown to the two sides only (the server answers 404 to anyone else, and this shows nothing then).
 * `hideWhenEmpty`: where the thread is not the page's point (a published build's page), show it only once it has posts.
 */
export function ReviewThread({
  buildId,
  side,
  hideWhenEmpty = false,
}: {
  buildId: number;
  side: 'maker' | 'moderator';
  hideWhenEmpty?: boolean;
}) {
  const thread = useQuery(reviewThreadQuery(buildId));
  const post = usePostToReviewThread(buildId);
  if (thread.isError || (hideWhenEmpty && thread.data?.items.length === 0)) return null;

  const items = thread.data?.items ?? [];
  const fieldId = `review-post-${buildId}-${side}`;
  return (
    <section id="review-thread" aria-labelledby={`${fieldId}-title`} className="space-y-3">
      <h2 id={`${fieldId}-title`} className="text-lg font-semibold">
        Review thread
      </h2>
      <p className="text-sm text-ink-soft">
        {side === 'maker'
          ? 'Between you and the moderators: answer a return note, or ask before you submit. Nobody else sees it.'
          : 'Between the maker and the moderators; nobody else sees it. The maker is notified of each post.'}
      </p>
      {thread.isPending ? (
        <p role="status" className="text-sm text-ink-soft">
          Loading the thread…
        </p>
      ) : items.length === 0 ? (
        <p className="text-sm text-ink-soft">Nothing here yet.</p>
      ) : (
        <ol className="space-y-2">
          {items.map((item) => (
            <Item key={`${item.type}-${item.id}`} item={item} />
          ))}
        </ol>
      )}
      {thread.data?.abilities.post && (
        <MarkdownPostForm
          id={fieldId}
          label={side === 'maker' ? 'Write to the moderators (Markdown)' : 'Write to the maker (Markdown)'}
          maxLength={MAX_REVIEW_POST_CHARS}
          variant="secondary"
          pending={post.isPending}
          error={post.error ? failure(post.error) : undefined}
          submitLabel="Send to the thread"
          pendingLabel="Sending…"
          onPost={(body, stored) => post.mutate({ body }, { onSuccess: stored })}
        />
      )}
    </section>
  );
}
