// The longest texts of the community's posts, apart from the zod schemas so a page that only shows the limit does not
// load the validation library.

/** Longest comment on a published build, in characters of Markdown. */
export const MAX_COMMENT_CHARS = 4000;

/** Longest post in a build's review thread, in characters of Markdown. */
export const MAX_REVIEW_POST_CHARS = 4000;
