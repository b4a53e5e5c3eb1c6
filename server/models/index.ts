import { DataTypes, type Sequelize } from 'sequelize';
import { User } from './user.model.ts';
import { AppMeta } from './app-meta.model.ts';
import { Part } from './part.model.ts';
import { Build } from './build.model.ts';
import { LogEntry } from './log-entry.model.ts';
import { Photo } from './photo.model.ts';
import { Actuator } from './actuator.model.ts';
import { CalibrationRun } from './calibration-run.model.ts';
import { AuditEntry } from './audit-entry.model.ts';
import { Report } from './report.model.ts';
import { BuildComment } from './build-comment.model.ts';
import { ReviewPost } from './review-post.model.ts';
import { Follow } from './follow.model.ts';
import { Notification } from './notification.model.ts';
import { BuildReviewSnapshot } from './build-review-snapshot.model.ts';
import { OutboxMail } from './outbox-mail.model.ts';
import { Listing } from './listing.model.ts';
import { ListingPhoto } from './listing-photo.model.ts';
import { PartPhoto } from './part-photo.model.ts';
import { Message, MessageThread } from './message.model.ts';
import { ApiToken } from './api-token.model.ts';
import { IdempotencyKey } from './idempotency-key.model.ts';
import { RateLimitCounter } from './rate-limit-counter.model.ts';

/** Bind every model to this process's Sequelize instance and declare associations. */
export function initModels(sequelize: Sequelize) {
  User.initModel(sequelize);
  AppMeta.initModel(sequelize);
  Part.initModel(sequelize);
  Build.initModel(sequelize);
  LogEntry.initModel(sequelize);
  Photo.initModel(sequelize);
  Actuator.initModel(sequelize);
  CalibrationRun.initModel(sequelize);
  AuditEntry.initModel(sequelize);
  Report.initModel(sequelize);
  BuildComment.initModel(sequelize);
  ReviewPost.initModel(sequelize);
  Follow.initModel(sequelize);
  Notification.initModel(sequelize);
  BuildReviewSnapshot.initModel(sequelize);
  OutboxMail.initModel(sequelize);
  Listing.initModel(sequelize);
  ListingPhoto.initModel(sequelize);
  PartPhoto.initModel(sequelize);
  MessageThread.initModel(sequelize);
  Message.initModel(sequelize);
  ApiToken.initModel(sequelize);
  IdempotencyKey.initModel(sequelize);
  RateLimitCounter.initModel(sequelize);
  Build.belongsTo(User, { as: 'owner', foreignKey: 'ownerId' });
  Actuator.belongsTo(Part, { as: 'part', foreignKey: 'partId' });
  // The session store's model; its table comes from a migration, never from sync().
  sequelize.define(
    'Session',
    {
      sid: { type: DataTypes.STRING(64), primaryKey: true },
      userId: DataTypes.INTEGER.UNSIGNED,
      expires: DataTypes.DATE,
      data: DataTypes.TEXT,
    },
    { tableName: 'sessions', underscored: true },
  );
  return {
    User,
    AppMeta,
    Part,
    Build,
    LogEntry,
    Photo,
    Actuator,
    CalibrationRun,
    AuditEntry,
    Report,
    OutboxMail,
    Listing,
    ListingPhoto,
    PartPhoto,
    MessageThread,
    Message,
    ApiToken,
    IdempotencyKey,
  };
}
