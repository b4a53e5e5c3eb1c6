import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** A moderator's publish note is the owner's unless the moderator marks it public; every older note stays private. */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('builds', 'review_note_public', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('builds', 'review_note_public');
};
