// The one rule for text people type into fields. Control characters are the C0 set U+0000–U+001F, DEL U+007F and
// the C1 set U+0080–U+009F [S: The Unicode Standard 15.0, §23.1 "Control Codes"]. A lone surrogate is a UTF-16
// code unit U+D800–U+DFFF not in a high–low pair: such a string is not well-formed [S: Unicode 15.0 §3.9, D89–D91]
// and has no UTF-8 form, so MariaDB's utf8mb4 would store "?" in its place; we refuse it instead.
import { z } from 'zod';

const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
// eslint-disable-next-line no-control-regex -- matching control characters is this pattern's purpose
const CONTROL = /[\u0000-\u001F\u007F-\u009F]/;
/** Tab, line feed and carriage return are part of multi-line text; every other control character is not. */
// eslint-disable-next-line no-control-regex -- as above
const CONTROL_BUT_LINES = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;

const codePoint = (c: string) => `U+${c.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;

function refuse(pattern: RegExp, what: string) {
  return (value: string, ctx: z.core.$RefinementCtx<string>) => {
    const lone = LONE_SURROGATE.exec(value);
    if (lone)
      ctx.addIssue({ code: 'custom', message: `Contains a broken character (a lone surrogate, ${codePoint(lone[0])}); retype it.` });
    const control = pattern.exec(value);
    if (control) ctx.addIssue({ code: 'custom', message: `${what} (${codePoint(control[0])} found).` });
  };
}

/**
 * A one-line field (titles, names, regions, labels, search text): no line breaks, tabs or other control characters
 * and no lone surrogates, checked before trimming so a line break is refused wherever it is; trimmed, at most `max`.
 */
export const singleLine = (max: number) =>
  z.string().superRefine(refuse(CONTROL, 'Must be one line without control characters')).trim().max(max);

/** Multi-line text (notes, write-ups, messages): line breaks and tabs allowed, other control characters and lone surrogates not. */
export const multiLine = (max: number) => z.string().superRefine(refuse(CONTROL_BUT_LINES, 'Contains a control character')).max(max);
