// When a calibration run counts in the parts registry, and when a moderator may decide it.
import type { BuildStatus } from '../schemas/build-vocabulary.ts';

/**
 * A run is decided while its build is on the desk or published: a draft (or a returned or declined build) is
 * still the maker's, and its runs could change before anyone reviews them. Only runs of published builds count.
 */
export const RUN_DECIDABLE_BUILD_STATUSES: readonly BuildStatus[] = ['submitted', 'published'];
