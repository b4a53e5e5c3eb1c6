import { useState, type DragEvent } from 'react';
import type { LogEntryDto } from '@shared/schemas/build.ts';
import { Button } from '@/components/ui/button.tsx';
import { inputClass } from './field.tsx';
import { PHOTO_ACCEPT } from './photo-errors.ts';
import { UploadQueueItem } from './upload-queue-item.tsx';
import { usePhotoQueue } from './use-photo-queue.ts';

/** Drop zone plus an ordinary file button; alt text per file; each file uploads with its own progress bar. */
export function PhotoUploader({ buildId, entries }: { buildId: number; entries: LogEntryDto[] }) {
  const queue = usePhotoQueue(buildId);
  const [over, setOver] = useState(false);
  const [entryId, setEntryId] = useState('');
  const pending = queue.items.filter((i) => i.state === 'ready' || i.state === 'failed').length;
  const done = queue.items.some((i) => i.state === 'done');

  const handleDrop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    if (e.dataTransfer.files.length > 0) queue.add(e.dataTransfer.files);
  };
  const handleUpload = () => {
    const missing = queue.uploadAll(entryId ? Number(entryId) : null);
    if (missing.length > 0) document.getElementById(`alt-${missing[0]}`)?.focus();
  };

  return (
    <div className="space-y-3">
      <div
        onDragOver={(e) => { e.preventDefault(); setOver(true); }}
        onDragLeave={() => setOver(false)}
        onDrop={handleDrop}
        className={`flex flex-col items-center gap-2 rounded-lg border-2 border-dashed p-6 text-center ${over ? 'border-copper bg-copper/5' : 'border-rule bg-white'}`}
      >
        <p className="text-sm text-ink-soft">Drag photos here, or</p>
        <label className="cursor-pointer rounded-md border border-teal bg-white px-3 py-1.5 text-sm font-medium text-teal-dark hover:bg-teal/10 has-[input:focus-visible]:outline-2 has-[input:focus-visible]:outline-offset-2 has-[input:focus-visible]:outline-copper">
          Choose photos
          <input type="file" multiple accept={PHOTO_ACCEPT} className="sr-only"
            onChange={(e) => { if (e.target.files) queue.add(e.target.files); e.target.value = ''; }} />
        </label>
        <p className="text-xs text-ink-soft">JPEG, PNG, WebP or AVIF, up to 20 MB each. Location data and other metadata are removed.</p>
      </div>
      {queue.items.length > 0 && (
        <>
          <ul className="space-y-2" aria-label="Photos to upload">
            {queue.items.map((i) => <UploadQueueItem key={i.key} item={i} onAlt={(alt) => queue.setAlt(i.key, alt)} onRemove={() => queue.remove(i.key)} />)}
          </ul>
          <div className="flex flex-wrap items-end gap-3">
            {entries.length > 0 && (
              <div>
                <label htmlFor="upload-entry" className="mb-1 block text-sm font-medium">Attach to log entry</label>
                <select id="upload-entry" className={inputClass} value={entryId} onChange={(e) => setEntryId(e.target.value)}>
                  <option value="">None (build gallery)</option>
                  {entries.map((e) => <option key={e.id} value={e.id}>{e.entryDate} · {e.title}</option>)}
                </select>
              </div>
            )}
            <Button onClick={handleUpload} disabled={pending === 0}>Upload {pending === 1 ? '1 photo' : `${pending} photos`}</Button>
            {done && <Button variant="ghost" onClick={queue.clearDone}>Clear uploaded</Button>}
          </div>
        </>
      )}
    </div>
  );
}
