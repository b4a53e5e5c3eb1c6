// News for the people who asked for it, written in the same transaction as the event itself:
// a notification in the app for each, and a mail of the "follows" kind to those who keep that kind on.
// - a new log entry on a published build → its followers;
// - a run that newly counts for a part (accepted on a published build, or its build published) → the part's followers;
// - a build published for the first time → its maker's followers.
// Decisions, review-thread posts and comments are told to the people they concern (`tell`).
import type { Transaction } from 'sequelize';
import type { FollowTargetType } from '@shared/schemas/follow.ts';
import type { MailKind } from '@shared/schemas/mail-choices.ts';
import type { NotificationKind } from '@shared/schemas/notification.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Part } from '../models/part.model.ts';
import { User } from '../models/user.model.ts';
import { followersOf } from './follow.service.ts';
import { notify } from './notification.service.ts';
import { enqueueMail } from './outbox.service.ts';
import { noticeMail } from './review-mails.ts';
import { nameRun, RUN_NAME_COLUMNS } from './audit-names.ts';

interface News {
  kind: NotificationKind;
  /** One line, for the notification and the mail. */
  text: string;
  path: string;
  subject: string;
  linkText: string;
  /** More lines for the mail only. */
  more?: string[];
}

/** Tell these people (not the one who caused it): a notification each, and a mail of `mailKind` where they want it. */
export async function tell(
  userIds: Iterable<number>,
  news: News,
  opts: { except?: number | null; mailKind: MailKind; essential?: boolean; transaction?: Transaction },
): Promise<void> {
  const ids = await notify(userIds, news, opts);
  if (!ids.length) return;
  const users = await User.findAll({
    where: { id: ids, suspendedAt: null },
    attributes: ['id', 'login', 'email', 'mailOptOut'],
    transaction: opts.transaction,
  });
  for (const user of users) {
    await enqueueMail(
      user,
      noticeMail({
        subject: news.subject,
        greeting: user.login,
        lines: [news.text, ...(news.more ?? [])],
        note: null,
        path: news.path,
        linkText: news.linkText,
      }),
      { essential: opts.essential ?? false, kind: opts.mailKind, transaction: opts.transaction },
    );
  }
}

async function tellFollowers(targets: Array<{ type: FollowTargetType; id: number }>, news: News, except: number, transaction: Transaction) {
  await tell(await followersOf(targets, transaction), news, { except, mailKind: 'follows', transaction });
}

/** A log entry was added to a build; followers hear of it once the build is public. */
export async function announceEntry(
  build: { id: number; title: string; ownerId: number; status: string },
  entry: { id: number; title: string },
  transaction: Transaction,
): Promise<void> {
  if (build.status !== 'published') return;
  await tellFollowers(
    [{ type: 'build', id: build.id }],
    {
      kind: 'follow-entry',
      text: `New log entry on “${build.title}”: ${entry.title}`,
      path: `/builds/${build.id}#entry-${entry.id}`,
      subject: `New log entry: ${build.title}`,
      linkText: 'Read the entry',
    },
    build.ownerId,
    transaction,
  );
}

/** These runs now count for their parts (each named as the audit trail names it); each part's followers hear of it. */
export async function announceCountedRuns(runIds: number[], buildTitle: string, transaction: Transaction): Promise<void> {
  if (!runIds.length) return;
  const runs = await CalibrationRun.findAll({ where: { id: runIds }, attributes: [...RUN_NAME_COLUMNS, 'buildId'], transaction });
  const parts = new Map(
    (await Part.findAll({ where: { id: [...new Set(runs.map((r) => r.partId))] }, attributes: ['id', 'name'], transaction })).map((p) => [
      p.id,
      p.name,
    ]),
  );
  for (const [partId, partName] of parts) {
    const mine = runs.filter((r) => r.partId === partId);
    const names = await Promise.all(mine.map((r) => nameRun(r, transaction)));
    await tellFollowers(
      [{ type: 'part', id: partId }],
      {
        kind: 'follow-run',
        text:
          mine.length === 1
            ? `A new run counts for ${partName}: ${names[0]} (build “${buildTitle}”)`
            : `${mine.length} new runs count for ${partName} (build “${buildTitle}”)`,
        more: mine.length > 1 ? names : undefined,
        path: `/parts/${partId}`,
        subject: `New runs for ${partName}`,
        linkText: 'Open the part',
      },
      mine[0]!.ownerId,
      transaction,
    );
  }
}

/** A build was published for the first time: its maker's followers hear of it, and its accepted runs now count. */
export async function announcePublished(
  build: { id: number; title: string; ownerId: number },
  firstTime: boolean,
  transaction: Transaction,
): Promise<void> {
  if (firstTime) {
    const owner = await User.findByPk(build.ownerId, { attributes: ['id', 'login'], transaction });
    await tellFollowers(
      [{ type: 'maker', id: build.ownerId }],
      {
        kind: 'follow-build',
        text: `${owner?.login ?? 'A maker you follow'} published a new build: “${build.title}”`,
        path: `/builds/${build.id}`,
        subject: `New build by ${owner?.login ?? 'a maker you follow'}: ${build.title}`,
        linkText: 'Open the build',
      },
      build.ownerId,
      transaction,
    );
  }
  const accepted = await CalibrationRun.findAll({
    where: { buildId: build.id, status: 'accepted' },
    attributes: ['id'],
    transaction,
  });
  await announceCountedRuns(
    accepted.map((r) => r.id),
    build.title,
    transaction,
  );
}
