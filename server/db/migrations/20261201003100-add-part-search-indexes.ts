import type { Migration } from '../migrator.ts';

/** Indexes for the registry's sorts and filters (each starts with status: only accepted parts are listed). */
export const up: Migration = async ({ context: qi }) => {
  await qi.addIndex('parts', ['status', 'category', 'gain_median_nm_per_v'], { name: 'parts_status_category_gain' });
  await qi.addIndex('parts', ['status', 'accepted_run_count'], { name: 'parts_status_runs' });
  await qi.addIndex('parts', ['status', 'created_at'], { name: 'parts_status_created' });
  await qi.addIndex('parts', ['status', 'name'], { name: 'parts_status_name' });
};
export const down: Migration = async ({ context: qi }) => {
  for (const name of ['parts_status_category_gain', 'parts_status_runs', 'parts_status_created', 'parts_status_name'])
    await qi.removeIndex('parts', name);
};
