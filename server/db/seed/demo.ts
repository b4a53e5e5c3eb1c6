import type { Sequelize } from 'sequelize';
import { AppMeta } from '../../models/app-meta.model.ts';
import { User } from '../../models/user.model.ts';
import { DEMO_ACCOUNTS, standInEmail, standInGithubId } from '../../dev/demo-accounts.ts';

const MARK = 'demo_seeded_at';

/** Seed the invented demo community once; a marker row keeps a restart from seeding again. */
export async function seedDemoOnce(sequelize: Sequelize): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const mark = await AppMeta.findByPk(MARK, { transaction, lock: transaction.LOCK.UPDATE });
    if (mark) return false;
    for (const a of DEMO_ACCOUNTS) {
      const existing = await User.findOne({ where: { login: a.login }, transaction });
      if (existing) continue;
      await User.create(
        { githubId: standInGithubId(a.login), login: a.login, name: a.name, email: standInEmail(a.login), avatarUrl: null, role: a.role },
        { transaction },
      );
    }
    await AppMeta.create({ metaKey: MARK, metaValue: new Date().toISOString() }, { transaction });
    return true;
  });
}
