import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import type { ThreadDto } from '@shared/schemas/listing.ts';
import { Button } from '@/components/ui/button.tsx';
import { paths } from '@/config/paths.ts';
import { useReplyInThread } from '../api/message-mutations.ts';
import { sendFailure } from './contact-form.tsx';
import { FormError, inputClass } from '@/components/ui/form-bits.tsx';
import { kindLabels } from './labels.ts';
import { formatMoment } from '@shared/format/dates.ts';

function ReplyBox({ thread }: { thread: ThreadDto }) {
  const reply = useReplyInThread(thread.id);
  const [body, setBody] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (body.trim()) reply.mutate({ body: body.trim() }, { onSuccess: () => setBody('') });
  };
  return (
    <form onSubmit={submit} className="space-y-2 rounded-lg border border-rule bg-white p-3">
      <label htmlFor="reply-body" className="block text-sm font-medium">
        Reply to {thread.other.login}
      </label>
      <textarea
        id="reply-body"
        rows={4}
        maxLength={4000}
        className={inputClass}
        value={body}
        aria-describedby="reply-privacy"
        onChange={(e) => setBody(e.target.value)}
      />
      <p id="reply-privacy" className="text-xs text-ink-soft">
        {thread.other.login} gets an e-mail that a reply is waiting; your address is not shown.
      </p>
      <FormError message={reply.isError ? sendFailure(reply.error) : undefined} />
      <Button type="submit" disabled={reply.isPending || !body.trim()}>
        {reply.isPending ? 'Sending…' : 'Send reply'}
      </Button>
    </form>
  );
}

/** One conversation about a listing: the messages in order, mine on the right, and a reply box. */
export function ThreadView({ thread }: { thread: ThreadDto }) {
  return (
    <div className="space-y-4">
      <p className="text-sm text-ink-soft">
        About{' '}
        <Link to={paths.listing(thread.listing.id)} className="text-copper-dark underline">
          {kindLabels[thread.listing.kind].toLowerCase()}: {thread.listing.partName}
        </Link>
        {thread.role === 'owner' ? ' (your listing)' : ` (${thread.other.login}'s listing)`}
      </p>
      <ol aria-label="Messages" className="space-y-3">
        {thread.messages.map((m) => (
          <li key={m.id} className={`flex ${m.fromMe ? 'justify-end' : 'justify-start'}`}>
            <div
              className={`max-w-[85%] rounded-lg border px-3 py-2 ${m.fromMe ? 'border-copper/40 bg-copper/5' : 'border-rule bg-white'}`}
            >
              <p className="text-xs text-ink-soft">
                <span className="font-medium text-ink">{m.fromMe ? 'You' : m.sender}</span> ·{' '}
                <span className="num">{formatMoment(m.createdAt)}</span>
              </p>
              <p className="mt-1 whitespace-pre-wrap break-words text-sm">{m.body}</p>
            </div>
          </li>
        ))}
      </ol>
      <ReplyBox thread={thread} />
    </div>
  );
}
