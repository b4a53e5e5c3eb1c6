import type { BuildDto } from '@shared/schemas/build.ts';
import { EditorSection } from './editor-section.tsx';
import { PhotoGallery } from './photo-gallery.tsx';
import { BuildPhotoUploader } from './build-photo-uploader.tsx';

/** Upload photos (alt text first), then arrange the gallery. */
export function PhotosSection({ build }: { build: BuildDto }) {
  return (
    <EditorSection id="photos" title="Photos" lead="Every photo needs a short description (alt text) for people who cannot see it.">
      <BuildPhotoUploader buildId={build.id} entries={build.entries} />
      <h3 className="mb-2 mt-6 font-semibold">Gallery</h3>
      <PhotoGallery build={build} />
    </EditorSection>
  );
}
