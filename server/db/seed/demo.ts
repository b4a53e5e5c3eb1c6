import type { Sequelize, Transaction } from 'sequelize';
import { fitRun } from '@shared/workbench/run-fit.ts';
import { AppMeta } from '../../models/app-meta.model.ts';
import { User } from '../../models/user.model.ts';
import { Part } from '../../models/part.model.ts';
import { Build } from '../../models/build.model.ts';
import { LogEntry } from '../../models/log-entry.model.ts';
import { Actuator } from '../../models/actuator.model.ts';
import { CalibrationRun } from '../../models/calibration-run.model.ts';
import { DEMO_ACCOUNTS, standInEmail, standInGithubId } from '../../dev/demo-accounts.ts';
import { runColumns } from '../../services/run.service.ts';
import { recomputePartStats } from '../../services/part-stats.service.ts';
import { DEMO_PARTS, type DemoPicture } from './demo-parts.ts';
import { DEMO_BUILDS, type DemoBuild } from './demo-builds.ts';
import { DEMO_LISTINGS } from './demo-listings.ts';
import { Listing } from '../../models/listing.model.ts';
import { demoSweep } from './demo-points.ts';

const MARK = 'demo_seeded_at';
const DAY = 24 * 60 * 60 * 1000;
const ago = (days: number) => new Date(Date.now() - days * DAY);

/** Hook for pictures: attach drawn photos to a build, a part or a listing inside the seed's transaction. */
export type AttachPictures = (
  target: { build: Build } | { partId: number } | { listingId: number },
  pictures: DemoPicture[],
  transaction: Transaction,
) => Promise<void>;

async function seedUsers(transaction: Transaction): Promise<Map<string, User>> {
  const users = new Map<string, User>();
  for (const a of DEMO_ACCOUNTS) {
    const existing = await User.findOne({ where: { login: a.login }, transaction });
    users.set(
      a.login,
      existing ??
        (await User.create(
          { githubId: standInGithubId(a.login), login: a.login, name: a.name, email: standInEmail(a.login), avatarUrl: null, role: a.role },
          { transaction },
        )),
    );
  }
  return users;
}

async function seedParts(users: Map<string, User>, attach: AttachPictures | null, transaction: Transaction): Promise<Map<string, Part>> {
  const parts = new Map<string, Part>();
  for (const p of DEMO_PARTS) {
    const { key, proposedBy, pictures, ...fields } = p;
    parts.set(
      key,
      await Part.create(
        {
          ...fields,
          lengthMm: p.lengthMm ?? null,
          widthMm: p.widthMm ?? null,
          thicknessMm: p.thicknessMm ?? null,
          outerDiameterMm: p.outerDiameterMm ?? null,
          wallMm: p.wallMm ?? null,
          layers: p.layers ?? null,
          capacitanceNf: p.capacitanceNf ?? null,
          safeVolts: p.safeVolts ?? null,
          proposedById: users.get(proposedBy)?.id ?? null,
        },
        { transaction },
      ),
    );
    if (attach && pictures?.length) await attach({ partId: parts.get(key)!.id }, pictures, transaction);
  }
  return parts;
}

async function seedBuild(
  b: DemoBuild,
  index: number,
  users: Map<string, User>,
  parts: Map<string, Part>,
  attach: AttachPictures | null,
  transaction: Transaction,
) {
  const owner = users.get(b.owner)!;
  const moderator = users.get('demo-moderator')!;
  const build = await Build.create(
    {
      ownerId: owner.id,
      title: b.title,
      instrumentKind: b.instrumentKind,
      summary: b.summary,
      body: b.body,
      stage: b.stage,
      status: b.status,
      editedSinceReview: b.editedSinceReview ?? false,
      reviewNote: b.reviewNote ?? null,
      submittedAt: b.status === 'draft' ? null : ago(b.daysAgo - 1),
      publishedAt: b.status === 'published' ? ago(b.daysAgo - 2) : null,
      createdAt: ago(b.daysAgo),
      updatedAt: ago(Math.max(0, b.daysAgo - 3)),
    },
    { transaction, silent: true },
  );
  for (const e of b.entries) {
    await LogEntry.create(
      { buildId: build.id, entryDate: ago(e.daysAgo).toISOString().slice(0, 10), title: e.title, body: e.body },
      { transaction },
    );
  }
  let seed = 1000 * (index + 1);
  for (const a of b.actuators) {
    const part = parts.get(a.part)!;
    const actuator = await Actuator.create(
      {
        buildId: build.id,
        partId: part.id,
        label: a.label,
        axis: a.axis,
        drive: a.drive,
        amplifier: a.amplifier ?? null,
        maxVolts: a.maxVolts ?? null,
        notes: null,
      },
      { transaction },
    );
    for (const r of a.runs) {
      const points = demoSweep({ ...r, unit: r.displacementUnit, seed: seed++ });
      const input = {
        kind: 'points' as const,
        points,
        voltageUnit: 'V' as const,
        displacementUnit: r.displacementUnit,
        model: 'intercept' as const,
        method: r.method,
        drive: { kind: 'dc-steps' as const },
      };
      const fit = fitRun(input);
      const reviewed = r.status !== 'pending';
      await CalibrationRun.create(
        {
          actuatorId: actuator.id,
          buildId: build.id,
          partId: part.id,
          ownerId: owner.id,
          status: r.status,
          ...runColumns(input, fit),
          reviewNote: r.reviewNote ?? null,
          reviewedById: reviewed ? moderator.id : null,
          reviewedAt: reviewed ? ago(r.daysAgo - 1) : null,
          createdAt: ago(r.daysAgo),
          updatedAt: ago(r.daysAgo),
        },
        { transaction, silent: true },
      );
    }
  }
  if (attach && b.pictures.length) await attach({ build }, b.pictures, transaction);
}

/** Seed the invented demo community once; a marker row keeps a restart from seeding again. */
export async function seedDemoOnce(sequelize: Sequelize, attach: AttachPictures | null = null): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const mark = await AppMeta.findByPk(MARK, { transaction, lock: transaction.LOCK.UPDATE });
    if (mark) return false;
    const users = await seedUsers(transaction);
    const parts = await seedParts(users, attach, transaction);
    for (const [i, b] of DEMO_BUILDS.entries()) await seedBuild(b, i, users, parts, attach, transaction);
    for (const part of parts.values()) await recomputePartStats(part.id, transaction);
    for (const l of DEMO_LISTINGS) {
      const listing = await Listing.create(
        {
          ownerId: users.get(l.owner)!.id,
          partId: parts.get(l.part)!.id,
          kind: l.kind,
          quantity: l.quantity,
          condition: l.condition,
          priceKind: l.priceKind,
          priceAmount: l.priceAmount ?? null,
          currency: l.currency ?? null,
          region: l.region,
          shipsTo: l.shipsTo ?? null,
          notes: l.notes,
          status: l.status ?? 'open',
        },
        { transaction },
      );
      if (attach && l.pictures?.length) await attach({ listingId: listing.id }, l.pictures, transaction);
    }
    await AppMeta.create({ metaKey: MARK, metaValue: new Date().toISOString() }, { transaction });
    return true;
  });
}
