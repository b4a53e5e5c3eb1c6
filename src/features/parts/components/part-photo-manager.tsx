import type { PartDetailDto } from '@shared/schemas/part.ts';
import { PhotoManager } from '@/components/photos/photo-manager.tsx';
import { usePartPhotoEdits } from '../api/part-photo-edits.ts';
import { useUploadPartPhoto } from '../api/upload-part-photo.ts';

/** For the part's proposer and moderators: add photos of the part; describe, reorder or delete them. */
export function PartPhotoManager({ part }: { part: PartDetailDto }) {
  const upload = useUploadPartPhoto(part.id);
  const edits = usePartPhotoEdits(part.id);
  return (
    <section aria-labelledby="part-photo-manager-title" className="space-y-3 rounded-lg border border-rule bg-white p-4">
      <h3 id="part-photo-manager-title" className="font-semibold">
        Add, describe or remove photos
      </h3>
      <PhotoManager photos={part.photos} upload={upload.mutateAsync} edits={edits} label="Photos you can change" />
    </section>
  );
}
