import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button.tsx';
import { paths } from '@/config/paths.ts';
import { ApiError } from '@/lib/api-client.ts';
import { useSendListingMessage } from '../api/message-mutations.ts';
import { FormError, inputClass } from '@/components/ui/form-bits.tsx';

/** Why a message did not go: our words for sending too fast, the server's otherwise. */
export function sendFailure(error: unknown): string {
  if (error instanceof ApiError && error.status === 429)
    return 'You have sent many messages in a short time. Wait a few minutes, then try again; what you wrote is still here.';
  return error instanceof Error ? error.message : 'The message was not sent; try again.';
}

/** Write to the listing's owner through the site; after sending, a link to the conversation in the inbox. */
export function ContactForm({ listingId, owner }: { listingId: number; owner: string }) {
  const send = useSendListingMessage(listingId);
  const [body, setBody] = useState('');
  const [empty, setEmpty] = useState(false);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!body.trim()) return setEmpty(true);
    send.mutate({ body: body.trim() }, { onSuccess: () => setBody('') });
  };
  return (
    <form onSubmit={submit} noValidate className="space-y-3 rounded-lg border border-rule bg-white p-4" aria-labelledby="contact-title">
      <h2 id="contact-title" className="text-lg font-semibold">
        Write to {owner}
      </h2>
      <p id="contact-privacy" className="text-sm text-ink-soft">
        Your message goes to {owner} through Scanwright; neither of you sees the other's e-mail address.
      </p>
      {send.isSuccess && (
        <p role="status" className="rounded-md border border-teal bg-teal/5 px-3 py-2 text-sm">
          Sent. {owner} gets an e-mail saying a message is waiting; the reply will be in your{' '}
          <Link to={paths.thread(send.data.threadId)} className="text-copper-dark underline">
            inbox
          </Link>
          .
        </p>
      )}
      <div>
        <label htmlFor="contact-body" className="mb-1 block text-sm font-medium">
          Message
        </label>
        <textarea
          id="contact-body"
          rows={5}
          maxLength={4000}
          className={inputClass}
          value={body}
          aria-invalid={empty && !body.trim() ? true : undefined}
          aria-describedby={empty && !body.trim() ? 'contact-body-error' : 'contact-privacy'}
          placeholder="Which parts, how many, shipping, a swap you have in mind…"
          onChange={(e) => setBody(e.target.value)}
        />
        {empty && !body.trim() && (
          <p id="contact-body-error" className="mt-1 text-sm text-danger">
            Write a message first.
          </p>
        )}
      </div>
      <FormError message={send.isError ? sendFailure(send.error) : undefined} />
      <Button type="submit" disabled={send.isPending}>
        {send.isPending ? 'Sending…' : 'Send message'}
      </Button>
    </form>
  );
}
