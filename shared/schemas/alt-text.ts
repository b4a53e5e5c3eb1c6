import { singleLine } from './text.ts';

/** A photo's description for people who cannot see it: required, one short paragraph. The same rule for build, part and listing photos. */
export const altText = singleLine(300).min(1, 'Describe the photo for people who cannot see it.');
