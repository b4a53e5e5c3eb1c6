import type { ReactNode } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { PhotoDropZone } from './photo-drop-zone.tsx';
import { UploadQueueItem } from './upload-queue-item.tsx';
import { usePhotoQueue, type SendPhoto } from './use-photo-queue.ts';

/**
 * Drop zone plus an ordinary file button; alt text per file; each file uploads with its own progress bar.
 * `send` stores one photo; `extra` goes along with every file and `controls` sit beside the Upload button
 * (a build picks its log entry there).
 */
export function PhotoUploader<E extends object>({ send, extra, controls }: { send: SendPhoto<E>; extra: E; controls?: ReactNode }) {
  const queue = usePhotoQueue(send);
  const pending = queue.items.filter((i) => i.state === 'ready' || i.state === 'failed').length;
  const done = queue.items.some((i) => i.state === 'done');

  const handleUpload = () => {
    const missing = queue.uploadAll(extra);
    if (missing.length > 0) document.getElementById(`alt-${missing[0]}`)?.focus();
  };

  return (
    <div className="space-y-3">
      <PhotoDropZone onFiles={queue.add} />
      {queue.items.length > 0 && (
        <>
          <ul className="space-y-2" aria-label="Photos to upload">
            {queue.items.map((i) => (
              <UploadQueueItem key={i.key} item={i} onAlt={(alt) => queue.setAlt(i.key, alt)} onRemove={() => queue.remove(i.key)} />
            ))}
          </ul>
          <div className="flex flex-wrap items-end gap-3">
            {controls}
            {pending > 0 && <Button onClick={handleUpload}>Upload {pending === 1 ? '1 photo' : `${pending} photos`}</Button>}
            {done && (
              <Button variant="ghost" onClick={queue.clearDone}>
                Clear uploaded
              </Button>
            )}
          </div>
        </>
      )}
    </div>
  );
}
