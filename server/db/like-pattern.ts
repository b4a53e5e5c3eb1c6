/** `%text%` for a LIKE search with the user's own `%`, `_` and `\` taken literally. */
export const containsPattern = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
