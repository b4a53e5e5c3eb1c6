import { Umzug, SequelizeStorage, type MigrationFn } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import * as createUsers from './migrations/20261201000100-create-users.ts';
import * as createSessions from './migrations/20261201000200-create-sessions.ts';
import * as createAppMeta from './migrations/20261201000300-create-app-meta.ts';
import * as createParts from './migrations/20261201001000-create-parts.ts';
import * as createBuilds from './migrations/20261201001100-create-builds.ts';
import * as createActuatorsAndRuns from './migrations/20261201001200-create-actuators-and-runs.ts';
import * as createReview from './migrations/20261201002000-create-review.ts';
import * as createExchange from './migrations/20261201003000-create-exchange.ts';
import * as addPartSearchIndexes from './migrations/20261201003100-add-part-search-indexes.ts';
import * as addPartDescIndexes from './migrations/20261201003200-add-part-desc-indexes.ts';
import * as createPartPhotos from './migrations/20261202000100-create-part-photos.ts';
import * as recomputeRunFits from './migrations/20261202100000-recompute-run-fits.ts';
import * as addRunKinds from './migrations/20261203120000-add-run-kinds.ts';
import * as addDataLicenceAcceptance from './migrations/20261203130000-add-data-licence-acceptance.ts';
import * as createApiTokens from './migrations/20261203100000-create-api-tokens.ts';
import * as createIdempotencyKeys from './migrations/20261203100100-create-idempotency-keys.ts';
import * as addActuatorDriveMatrix from './migrations/20261203140000-add-actuator-drive-matrix.ts';
import * as addOutboxClaims from './migrations/20261203150000-add-outbox-claims.ts';
import * as addActuatorLinearisation from './migrations/20261203160000-add-actuator-linearisation.ts';
import * as addIdempotencyApplied from './migrations/20261203170000-add-idempotency-applied.ts';
import * as addAuditTargetLabel from './migrations/20261210000100-add-audit-target-label.ts';
import * as recountPublishedRuns from './migrations/20261210000200-recount-published-runs.ts';
import * as addBuildReviewNotePublic from './migrations/20261210000300-add-build-review-note-public.ts';
import * as createBuildComments from './migrations/20261212000100-create-build-comments.ts';
import * as createConversationsAndFollows from './migrations/20261214000100-create-conversations-and-follows.ts';
import * as createBuildReviewSnapshots from './migrations/20261213000100-create-build-review-snapshots.ts';
import * as createRateLimitCounters from './migrations/20261215000100-create-rate-limit-counters.ts';

export type Migration = MigrationFn<QueryInterface>;

/** Listed explicitly (not globbed) so the same list runs under tsx, vitest and a bundler. */
const migrations: Array<[string, { up: Migration; down: Migration }]> = [
  ['20261201000100-create-users', createUsers],
  ['20261201000200-create-sessions', createSessions],
  ['20261201000300-create-app-meta', createAppMeta],
  ['20261201001000-create-parts', createParts],
  ['20261201001100-create-builds', createBuilds],
  ['20261201001200-create-actuators-and-runs', createActuatorsAndRuns],
  ['20261201002000-create-review', createReview],
  ['20261201003000-create-exchange', createExchange],
  ['20261201003100-add-part-search-indexes', addPartSearchIndexes],
  ['20261201003200-add-part-desc-indexes', addPartDescIndexes],
  ['20261202000100-create-part-photos', createPartPhotos],
  ['20261202100000-recompute-run-fits', recomputeRunFits],
  ['20261203100000-create-api-tokens', createApiTokens],
  ['20261203100100-create-idempotency-keys', createIdempotencyKeys],
  ['20261203120000-add-run-kinds', addRunKinds],
  ['20261203130000-add-data-licence-acceptance', addDataLicenceAcceptance],
  ['20261203140000-add-actuator-drive-matrix', addActuatorDriveMatrix],
  ['20261203150000-add-outbox-claims', addOutboxClaims],
  ['20261203160000-add-actuator-linearisation', addActuatorLinearisation],
  ['20261203170000-add-idempotency-applied', addIdempotencyApplied],
  ['20261210000100-add-audit-target-label', addAuditTargetLabel],
  ['20261210000200-recount-published-runs', recountPublishedRuns],
  ['20261210000300-add-build-review-note-public', addBuildReviewNotePublic],
  ['20261212000100-create-build-comments', createBuildComments],
  ['20261214000100-create-conversations-and-follows', createConversationsAndFollows],
  ['20261213000100-create-build-review-snapshots', createBuildReviewSnapshots],
  ['20261215000100-create-rate-limit-counters', createRateLimitCounters],
];

/** Umzug over our migration list; the only source of the schema, in tests too. */
export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: migrations.map(([name, m]) => ({ name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}
