import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { describe, inputClass } from '@/components/ui/form-bits.tsx';
import { fileSize } from './photo-errors.ts';
import type { QueuedPhoto } from './use-photo-queue.ts';

const stateText = (i: QueuedPhoto) => {
  switch (i.state) {
    case 'ready':
      return i.alt.trim() ? 'Ready to upload' : 'Needs alt text';
    case 'queued':
      return 'Waiting for its turn';
    case 'uploading':
      return `Uploading ${Math.round(i.progress * 100)} %`;
    case 'processing':
      return 'Sent; Scanwright is processing the photo…';
    case 'done':
      return 'Uploaded';
    case 'failed':
      return 'Not uploaded';
  }
};

/** One picked file: preview, its alt text, a progress bar while it uploads, and what went wrong if it did. */
export function UploadQueueItem({ item, onAlt, onRemove }: { item: QueuedPhoto; onAlt: (alt: string) => void; onRemove: () => void }) {
  const [noPreview, setNoPreview] = useState(false);
  const id = `alt-${item.key}`;
  const busy = item.state === 'queued' || item.state === 'uploading' || item.state === 'processing';
  const altError = item.altMissing ? 'Describe the photo before uploading it.' : undefined;
  const percent = Math.round(item.progress * 100);
  const bar = item.state === 'failed' ? 'bg-danger' : item.state === 'done' ? 'bg-teal' : 'bg-copper';
  return (
    <li className="grid grid-cols-[4rem_1fr] gap-3 rounded-md border border-rule bg-white p-3 sm:grid-cols-[5rem_1fr]">
      {noPreview ? (
        <span className="flex h-16 w-16 items-center justify-center rounded bg-paper-deep text-center text-xs text-ink-soft sm:h-20 sm:w-20">
          No preview
        </span>
      ) : (
        <img src={item.previewUrl} alt="" className="h-16 w-16 rounded object-cover sm:h-20 sm:w-20" onError={() => setNoPreview(true)} />
      )}
      <div className="min-w-0 space-y-2">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <p className="min-w-0 truncate text-sm font-medium" title={item.file.name}>
            {item.file.name} <span className="num font-normal text-ink-soft">{fileSize(item.file.size)}</span>
          </p>
          {item.state !== 'done' && (
            <Button
              variant="ghost"
              className="px-2 py-0.5 text-xs"
              onClick={onRemove}
              aria-label={`${busy ? 'Cancel' : 'Remove'} ${item.file.name}`}
            >
              {busy ? 'Cancel' : 'Remove'}
            </Button>
          )}
        </div>
        {item.state !== 'done' && (
          <div>
            <label htmlFor={id} className="mb-1 block text-xs font-medium">
              Alt text for {item.file.name} (required)
            </label>
            <input
              id={id}
              value={item.alt}
              disabled={busy}
              maxLength={300}
              className={`${inputClass} disabled:bg-paper-deep`}
              placeholder="What the photo shows, for people who cannot see it"
              onChange={(e) => onAlt(e.target.value)}
              {...describe(id, altError)}
            />
            {altError && (
              <p id={`${id}-error`} className="mt-1 text-sm text-danger">
                {altError}
              </p>
            )}
          </div>
        )}
        {item.state === 'done' && <p className="text-sm">{item.alt}</p>}
        <div
          role="progressbar"
          aria-label={`Upload of ${item.file.name}`}
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={percent}
          aria-valuetext={stateText(item)}
          className="h-2 overflow-hidden rounded-full bg-paper-deep"
        >
          <div className={`h-full ${bar} transition-[width]`} style={{ width: `${item.state === 'failed' ? 100 : percent}%` }} />
        </div>
        <p className={`text-xs ${item.state === 'failed' ? 'text-danger' : 'text-ink-soft'}`} aria-live="polite">
          {stateText(item)}
          {item.error && (
            <>
              : <span className="font-medium">{item.error}</span>
            </>
          )}
        </p>
      </div>
    </li>
  );
}
