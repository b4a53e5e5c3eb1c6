import { randomBytes } from 'node:crypto';
import type { Role } from '../../shared/policies.ts';
import { User } from '../../server/models/user.model.ts';
import { standInGithubId, standInEmail } from '../../server/dev/demo-accounts.ts';

/** A handle no other test uses. */
export const uniqueLogin = (prefix = 'maker') => `${prefix}-${randomBytes(4).toString('hex')}`;

/** A user row that the OAuth stand-in will sign in as (same id scheme). */
export async function createUser(overrides: { login?: string; role?: Role; suspendedAt?: Date | null } = {}) {
  const login = overrides.login ?? uniqueLogin();
  return User.create({
    githubId: standInGithubId(login),
    login,
    name: login,
    email: standInEmail(login),
    avatarUrl: null,
    role: overrides.role ?? 'maker',
    suspendedAt: overrides.suspendedAt ?? null,
  });
}

/** A listed registry part (accepted), bimorph by default. */
export async function createPart(
  overrides: Partial<{
    name: string;
    category: string;
    status: string;
    material: string | null;
    lengthMm: number | null;
    thicknessMm: number | null;
    proposedById: number | null;
  }> = {},
) {
  const { Part } = await import('../../server/models/part.model.ts');
  return Part.create({
    category: (overrides.category ?? 'bimorph') as 'bimorph',
    name: overrides.name ?? `Test bar ${randomBytes(3).toString('hex')}`,
    salvageSource: 'test bench',
    material: overrides.material === undefined ? 'PZT-5A' : overrides.material,
    lengthMm: overrides.lengthMm === undefined ? 12 : overrides.lengthMm,
    widthMm: null,
    thicknessMm: overrides.thicknessMm === undefined ? 0.6 : overrides.thicknessMm,
    outerDiameterMm: null,
    wallMm: null,
    layers: null,
    capacitanceNf: 1,
    safeVolts: 60,
    notes: null,
    status: (overrides.status ?? 'accepted') as 'accepted',
    proposedById: overrides.proposedById ?? null,
  });
}

/** A build row owned by `ownerId` in the given state. */
export async function createBuildRow(ownerId: number, overrides: Partial<{ status: string; title: string; instrumentKind: string }> = {}) {
  const { Build } = await import('../../server/models/build.model.ts');
  return Build.create({
    ownerId,
    title: overrides.title ?? `Build ${randomBytes(3).toString('hex')}`,
    instrumentKind: (overrides.instrumentKind ?? 'profilometer') as 'profilometer',
    summary: 'A test build.',
    body: '',
    status: (overrides.status ?? 'draft') as 'draft',
    publishedAt: overrides.status === 'published' ? new Date() : null,
  });
}

/** An actuator row on `buildId` using `partId` (a Z single element unless told otherwise), without runs. */
export async function createActuatorRow(opts: { buildId: number; partId: number; axis?: string; drive?: string }) {
  const { Actuator } = await import('../../server/models/actuator.model.ts');
  return Actuator.create({
    buildId: opts.buildId,
    partId: opts.partId,
    label: null,
    axis: (opts.axis ?? 'Z') as 'Z',
    drive: (opts.drive ?? 'single') as 'single',
    amplifier: null,
    maxVolts: null,
    notes: null,
  });
}

/** An actuator on `buildId` using `partId`, with one run whose points follow `gainNmPerV` (fit computed by the shared code). */
export async function createRunRow(opts: {
  buildId: number;
  partId: number;
  ownerId: number;
  gainNmPerV: number;
  status?: 'pending' | 'accepted' | 'rejected';
  hysteresis?: number;
}) {
  const { Actuator } = await import('../../server/models/actuator.model.ts');
  const { CalibrationRun } = await import('../../server/models/calibration-run.model.ts');
  const { runColumns } = await import('../../server/services/run.service.ts');
  const { fitRun } = await import('../../shared/workbench/run-fit.ts');
  const { demoSweep } = await import('../../server/db/seed/demo-points.ts');
  const actuator = await Actuator.create({
    buildId: opts.buildId,
    partId: opts.partId,
    label: null,
    axis: 'X',
    drive: 'single',
    amplifier: null,
    maxVolts: 40,
    notes: null,
  });
  const points = demoSweep({
    gainNmPerV: opts.gainNmPerV,
    loopFraction: opts.hysteresis ?? 0.05,
    noiseNm: 0.5,
    maxVolts: 40,
    steps: 8,
    unit: 'nm',
    seed: Math.floor(Math.random() * 1e9),
  });
  const input = {
    kind: 'points' as const,
    points,
    voltageUnit: 'V' as const,
    displacementUnit: 'nm' as const,
    model: 'intercept' as const,
    method: 'indicator' as const,
  };
  const fit = fitRun(input);
  return CalibrationRun.create({
    actuatorId: actuator.id,
    buildId: opts.buildId,
    partId: opts.partId,
    ownerId: opts.ownerId,
    status: opts.status ?? 'pending',
    ...runColumns(input, fit),
  });
}

/** An open listing of a fresh part owned by `ownerId`, free, in one region. */
export async function createListingRow(
  ownerId: number,
  overrides: Partial<{ status: 'open' | 'reserved' | 'closed'; hiddenAt: Date | null }> = {},
) {
  const { Listing } = await import('../../server/models/listing.model.ts');
  const part = await createPart();
  return Listing.create({
    ownerId,
    partId: part.id,
    kind: 'offering',
    quantity: 3,
    condition: 'new',
    priceKind: 'free',
    priceAmount: null,
    currency: null,
    region: 'Here',
    shipsTo: null,
    notes: null,
    ...overrides,
  });
}
