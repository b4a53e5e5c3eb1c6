// Pictures for the demo builds, drawn here as SVG and rendered by sharp: schematic scenes in our
// palette, no photographs. Stored through the same pipeline as uploads.
import sharp from 'sharp';
import type { PhotoStore } from '../../storage/photo-store.ts';
import type { Transaction } from 'sequelize';
import { Photo } from '../../models/photo.model.ts';
import { PartPhoto } from '../../models/part-photo.model.ts';
import { ListingPhoto } from '../../models/listing-photo.model.ts';
import { processPhoto, writeVariants } from '../../services/photo-storage.ts';
import { storedColumns } from '../../services/photo-files.ts';
import type { AttachPictures } from './demo.ts';
import type { DemoPicture } from './demo-parts.ts';

type Scene = DemoPicture['scene'];

const frame = (body: string) => `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="800" viewBox="0 0 1200 800">
<rect width="1200" height="800" fill="#ECE8DF"/><rect x="0" y="640" width="1200" height="160" fill="#cfc8ba"/>${body}</svg>`;

const SCENES: Record<Scene, string> = {
  bench: frame(`<rect x="180" y="520" width="840" height="120" rx="10" fill="#4A525C"/>
<circle cx="260" cy="660" r="30" fill="#C98A00"/><circle cx="940" cy="660" r="30" fill="#C98A00"/>
<rect x="260" y="360" width="90" height="160" fill="#2F6F73"/><rect x="850" y="380" width="80" height="140" fill="#2F6F73"/>
<line x1="350" y1="410" x2="600" y2="470" stroke="#B42318" stroke-width="4"/><line x1="600" y1="470" x2="850" y2="430" stroke="#B42318" stroke-width="4"/>
<rect x="540" y="430" width="130" height="90" fill="#1D232B"/><path d="M600 480 l40 0 l-12 36 z" fill="#B5532A"/>`),
  head: frame(`<rect x="420" y="120" width="360" height="420" rx="30" fill="#4A525C"/>
<rect x="540" y="180" width="120" height="300" rx="12" fill="#F6F4EF" stroke="#2F6F73" stroke-width="8"/>
<line x1="600" y1="180" x2="600" y2="480" stroke="#2F6F73" stroke-width="4" stroke-dasharray="12 10"/>
<path d="M585 480 h30 l-15 60 z" fill="#B5532A"/>
${Array.from({ length: 12 }, (_, i) => `<circle cx="${330 + i * 50}" cy="600" r="18" fill="#2F6F73"/>`).join('')}`),
  plot: frame(`<rect x="120" y="100" width="960" height="500" fill="#fff" stroke="#1D232B" stroke-width="3"/>
<path d="M140 520 L380 520 L400 440 L640 440 L660 360 L900 360 L920 280 L1060 280" fill="none" stroke="#B5532A" stroke-width="6"/>
<text x="600" y="660" font-size="36" text-anchor="middle" fill="#1D232B" font-family="sans-serif">distance along the line</text>`),
  stage: frame(`<rect x="250" y="260" width="700" height="300" rx="16" fill="#9aa3ad"/>
<rect x="330" y="330" width="160" height="60" fill="#C98A00"/><rect x="700" y="420" width="60" height="110" fill="#C98A00"/>
<path d="M520 360 q30 -40 60 0 t60 0" fill="none" stroke="#1D232B" stroke-width="6"/>
<rect x="560" y="300" width="120" height="120" fill="#F6F4EF" stroke="#2F6F73" stroke-width="6"/><circle cx="620" cy="360" r="14" fill="#B5532A"/>`),
  bar: frame(`<rect x="150" y="470" width="900" height="90" fill="#F6F4EF" stroke="#1D232B" stroke-width="3"/>
${Array.from({ length: 46 }, (_, i) => `<line x1="${170 + i * 19}" y1="470" x2="${170 + i * 19}" y2="${i % 5 === 0 ? 515 : 495}" stroke="#1D232B" stroke-width="2"/>`).join('')}
<rect x="300" y="330" width="600" height="56" rx="4" fill="#9aa3ad" stroke="#4A525C" stroke-width="4"/><rect x="300" y="352" width="600" height="12" fill="#C98A00"/>
<path d="M300 345 C220 330 200 300 160 290" fill="none" stroke="#B42318" stroke-width="5"/><path d="M300 375 C220 390 200 420 160 430" fill="none" stroke="#1D232B" stroke-width="5"/>`),
  disc: frame(`<circle cx="600" cy="380" r="250" fill="#C98A00"/><circle cx="600" cy="380" r="170" fill="#F6F4EF" stroke="#9aa3ad" stroke-width="6"/>
<circle cx="600" cy="380" r="150" fill="#dcd6ca"/><circle cx="640" cy="350" r="14" fill="#9aa3ad"/><circle cx="800" cy="470" r="14" fill="#9aa3ad"/>
<path d="M640 350 C760 250 900 220 1080 200" fill="none" stroke="#B42318" stroke-width="6"/><path d="M800 470 C900 460 980 420 1080 400" fill="none" stroke="#1D232B" stroke-width="6"/>`),
  tube: frame(`<ellipse cx="600" cy="200" rx="120" ry="40" fill="#dcd6ca" stroke="#4A525C" stroke-width="5"/>
<path d="M480 200 v380 a120 40 0 0 0 240 0 v-380" fill="#F6F4EF" stroke="#4A525C" stroke-width="5"/>
<line x1="560" y1="238" x2="560" y2="618" stroke="#2F6F73" stroke-width="5"/><line x1="640" y1="238" x2="640" y2="618" stroke="#2F6F73" stroke-width="5"/>
<ellipse cx="600" cy="200" rx="70" ry="22" fill="#4A525C"/>
${['X+', 'Y+', 'X−'].map((t, i) => `<text x="${520 + i * 80}" y="420" font-size="34" text-anchor="middle" fill="#1D232B" font-family="sans-serif">${t}</text>`).join('')}`),
};

/** Render each scene, store it like an upload, and add the rows (build, part or listing photos) inside the seed's transaction. */
export function demoPictureAttacher(store: PhotoStore): AttachPictures {
  return async (target, pictures, transaction: Transaction) => {
    for (const [position, picture] of pictures.entries()) {
      const png = await sharp(Buffer.from(SCENES[picture.scene])).png().toBuffer();
      const processed = await processPhoto(png);
      await writeVariants(store, [processed]);
      const stored = { ...storedColumns(processed), alt: picture.alt, position };
      if ('build' in target)
        await Photo.create({ ...stored, buildId: target.build.id, entryId: null, ownerId: target.build.ownerId }, { transaction });
      else if ('partId' in target) await PartPhoto.create({ ...stored, partId: target.partId }, { transaction });
      else await ListingPhoto.create({ ...stored, listingId: target.listingId }, { transaction });
    }
  };
}
