import { useEffect, useRef, type KeyboardEvent } from 'react';

/** What the lightbox needs of a picture: the large image, its size and its description. */
export interface LightboxImage {
  id: number | string;
  url: string;
  alt: string;
  width: number;
  height: number;
}

const FOCUSABLE = 'button:not([disabled]), a[href], [tabindex]:not([tabindex="-1"])';
const control = 'rounded-md border border-white/40 px-3 py-1.5 text-sm font-medium text-white hover:bg-white/15 disabled:opacity-40';

/**
 * A modal dialog showing one picture large with its description as the caption. Esc closes,
 * ←/→ move, Tab stays inside, and focus goes back to whatever opened it.
 */
export function Lightbox({
  images,
  index,
  onIndexChange,
  onClose,
  label = 'Photo',
}: {
  images: LightboxImage[];
  index: number;
  onIndexChange: (index: number) => void;
  onClose: () => void;
  label?: string;
}) {
  const dialog = useRef<HTMLDialogElement>(null);
  const image = images[index];
  const count = images.length;

  useEffect(() => {
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    const d = dialog.current;
    if (d && !d.open) d.showModal();
    return () => {
      if (d?.open) d.close();
      opener?.focus();
    };
  }, []);

  const move = (delta: number) => onIndexChange((index + delta + count) % count);

  const handleKeyDown = (e: KeyboardEvent<HTMLDialogElement>) => {
    if (e.key === 'ArrowLeft' && count > 1) {
      e.preventDefault();
      move(-1);
    } else if (e.key === 'ArrowRight' && count > 1) {
      e.preventDefault();
      move(1);
    } else if (e.key === 'Tab') {
      const items = Array.from(dialog.current?.querySelectorAll<HTMLElement>(FOCUSABLE) ?? []);
      if (items.length === 0) return;
      const first = items[0]!;
      const last = items[items.length - 1]!;
      if (e.shiftKey && document.activeElement === first) {
        e.preventDefault();
        last.focus();
      } else if (!e.shiftKey && document.activeElement === last) {
        e.preventDefault();
        first.focus();
      }
    }
  };

  if (!image) return null;
  return (
    <dialog
      ref={dialog}
      aria-label={`${label} ${index + 1} of ${count}`}
      className="m-auto max-h-none max-w-none rounded-lg bg-ink p-0 shadow-2xl backdrop:bg-ink/90"
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      onKeyDown={handleKeyDown}
      onClick={(e) => {
        if (e.target === e.currentTarget) onClose();
      }}
    >
      <figure className="flex max-h-[calc(100dvh-2rem)] w-[min(96vw,72rem)] flex-col items-center gap-3 p-3 text-white sm:p-4">
        <div className="flex w-full items-center justify-between gap-2">
          <p className="num text-sm text-white/80">
            {index + 1} / {count}
          </p>
          <button type="button" className={control} onClick={onClose} autoFocus>
            Close
          </button>
        </div>
        <img
          key={image.id}
          src={image.url}
          alt={image.alt}
          width={image.width}
          height={image.height}
          className="max-h-[calc(100dvh-12rem)] w-auto max-w-full rounded bg-paper-deep object-contain"
        />
        <figcaption className="max-w-3xl text-center text-sm">{image.alt}</figcaption>
        {count > 1 && (
          <div className="flex gap-2">
            <button type="button" className={control} onClick={() => move(-1)} aria-label="Previous photo">
              ← Previous
            </button>
            <button type="button" className={control} onClick={() => move(1)} aria-label="Next photo">
              Next →
            </button>
          </div>
        )}
      </figure>
    </dialog>
  );
}
