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
export async function createPart(overrides: Partial<{ name: string; category: string; status: string; material: string | null; lengthMm: number | null; thicknessMm: number | null; proposedById: number | null }> = {}) {
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
