import { useState } from 'react';
import type { LogEntryDto } from '@shared/schemas/build.ts';
import { PhotoUploader } from '@/components/photos/photo-uploader.tsx';
import { useUploadPhoto } from '../../api/upload-photos.ts';
import { inputClass } from '@/components/ui/form-bits.tsx';

/** The shared uploader, sending to this build; new photos go to the gallery or to the log entry picked beside Upload. */
export function BuildPhotoUploader({ buildId, entries }: { buildId: number; entries: LogEntryDto[] }) {
  const upload = useUploadPhoto(buildId);
  const [entryId, setEntryId] = useState('');
  const entryPicker = entries.length > 0 && (
    <div>
      <label htmlFor="upload-entry" className="mb-1 block text-sm font-medium">
        Attach to log entry
      </label>
      <select id="upload-entry" className={inputClass} value={entryId} onChange={(e) => setEntryId(e.target.value)}>
        <option value="">None (build gallery)</option>
        {entries.map((e) => (
          <option key={e.id} value={e.id}>
            {e.entryDate} · {e.title}
          </option>
        ))}
      </select>
    </div>
  );
  return <PhotoUploader send={upload.mutateAsync} extra={{ entryId: entryId ? Number(entryId) : null }} controls={entryPicker} />;
}
