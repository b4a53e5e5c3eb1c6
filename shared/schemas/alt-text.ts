import { z } from 'zod';

/** A photo's description for people who cannot see it: required, one short paragraph. The same rule for build, part and listing photos. */
export const altText = z.string().trim().min(1, 'Describe the photo for people who cannot see it.').max(300);
