// How a source tag reads on a page. Code and tests keep FIELD.md's tags ([S: …], [calc], [practice],
// [memory]); people read words.

/** A FIELD.md tag (or a text holding tags) in words: "Source: Chen, APL 1992", "common practice", … */
export function sourceInWords(tagged: string): string {
  return tagged
    .replace(/\[S: ([^\]]+?)(?: — memory for ([^\]]+))?\]/g, (_m, src: string, what?: string) =>
      what ? `Source: ${src} (${what} recalled, not yet checked)` : `Source: ${src}`,
    )
    .replace(/\[calc(?:: ([^\]]+))?\]/g, (_m, how?: string) => (how ? `calculated: ${how}` : 'calculated from the formula'))
    .replace(/\[practice(?:;[^\]]*)?\]/g, 'common practice')
    .replace(/\[memory(?:: ([^\]]+))?\]/g, (_m, what?: string) =>
      what ? `recalled value (${what}), not yet checked against a source` : 'recalled value, not yet checked against a source',
    );
}
