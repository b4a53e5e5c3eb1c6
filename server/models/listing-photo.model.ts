import type { Sequelize } from 'sequelize';
import { AttachedPhoto, attachedPhotoAttributes } from './attached-photo.ts';

/** A photo of an exchange listing. */
export class ListingPhoto extends AttachedPhoto {
  declare listingId: number;

  static initModel(sequelize: Sequelize) {
    ListingPhoto.init(attachedPhotoAttributes('listingId'), {
      sequelize,
      tableName: 'listing_photos',
      modelName: 'ListingPhoto',
      underscored: true,
    });
  }
}
