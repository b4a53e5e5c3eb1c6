import type { PartDetailDto } from '@shared/schemas/part.ts';
import { PhotoManager } from '@/components/photos/photo-manager.tsx';
import { useDeletePartPhoto } from '../api/delete-part-photo.ts';
import { useUploadPartPhoto } from '../api/upload-part-photo.ts';

/** For the part's proposer and moderators: add photos of the part, or delete one. */
export function PartPhotoManager({ part }: { part: PartDetailDto }) {
  const upload = useUploadPartPhoto(part.id);
  const remove = useDeletePartPhoto(part.id);
  return (
    <section aria-labelledby="part-photo-manager-title" className="space-y-3 rounded-lg border border-rule bg-white p-4">
      <h3 id="part-photo-manager-title" className="font-semibold">Add or remove photos</h3>
      <PhotoManager photos={part.photos} upload={upload.mutateAsync} remove={remove.mutateAsync} label="Photos you can delete" />
    </section>
  );
}
