import type { Sequelize } from 'sequelize';
import { AttachedPhoto, attachedPhotoAttributes } from './attached-photo.ts';

/** A photo of a registry part (the transducer itself, its markings, where it sits in the donor device). */
export class PartPhoto extends AttachedPhoto {
  declare partId: number;

  static initModel(sequelize: Sequelize) {
    PartPhoto.init(attachedPhotoAttributes('partId'), { sequelize, tableName: 'part_photos', modelName: 'PartPhoto', underscored: true });
  }
}
