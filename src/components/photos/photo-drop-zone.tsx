import { useState, type DragEvent } from 'react';
import { PHOTO_ACCEPT } from './photo-errors.ts';

/** Where files come in: drop them on the dashed box, or press the ordinary file button (keyboard users). */
export function PhotoDropZone({ onFiles }: { onFiles: (files: FileList) => void }) {
  const [over, setOver] = useState(false);
  const handleDrop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    if (e.dataTransfer.files.length > 0) onFiles(e.dataTransfer.files);
  };
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={handleDrop}
      className={`flex flex-col items-center gap-2 rounded-lg border-2 border-dashed p-6 text-center ${over ? 'border-copper bg-copper/5' : 'border-rule bg-white'}`}
    >
      <p className="text-sm text-ink-soft">Drag photos here, or</p>
      <label
        className={
          'cursor-pointer rounded-md border border-teal bg-white px-3 py-1.5 text-sm font-medium text-teal-dark ' +
          'hover:bg-teal/10 has-[input:focus-visible]:outline-2 has-[input:focus-visible]:outline-offset-2 ' +
          'has-[input:focus-visible]:outline-copper'
        }
      >
        Choose photos
        <input
          type="file"
          multiple
          accept={PHOTO_ACCEPT}
          className="sr-only"
          onChange={(e) => {
            if (e.target.files) onFiles(e.target.files);
            e.target.value = '';
          }}
        />
      </label>
      <p className="text-xs text-ink-soft">JPEG, PNG, WebP or AVIF, up to 20 MB each. Location data and other metadata are removed.</p>
    </div>
  );
}
