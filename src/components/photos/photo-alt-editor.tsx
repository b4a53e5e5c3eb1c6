import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { inputClass } from '@/components/ui/form-bits.tsx';

/** Edit a stored photo's alt text; Save appears once it differs. */
export function PhotoAltEditor({
  photoId,
  alt,
  pending,
  onSave,
}: {
  photoId: number;
  alt: string;
  pending: boolean;
  onSave: (alt: string) => void;
}) {
  const [value, setValue] = useState(alt);
  const id = `photo-${photoId}-alt`;
  const changed = value.trim() !== alt && value.trim().length > 0;
  return (
    <form
      className="flex items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        if (changed) onSave(value.trim());
      }}
    >
      <div className="min-w-0 flex-1">
        <label htmlFor={id} className="mb-1 block text-xs font-medium">
          Alt text
        </label>
        <input id={id} className={`${inputClass} text-sm`} value={value} maxLength={300} onChange={(e) => setValue(e.target.value)} />
      </div>
      {changed && (
        <Button type="submit" variant="secondary" disabled={pending}>
          Save
        </Button>
      )}
    </form>
  );
}
