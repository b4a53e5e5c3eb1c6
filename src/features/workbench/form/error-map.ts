// Plain-language messages for the workbench forms; schema-level messages (e.g. "Each minimum must
// be below its maximum.") keep precedence over this map.
import type { z } from 'zod';
import { FitInputError } from '@shared/workbench/fit-input-error.ts';
import { asSentence } from '@shared/format/sentence.ts';

type Issue = Parameters<z.core.$ZodErrorMap>[0];

const bound = (n: number | bigint) => String(n).replace('-', '\u2212');

/** Error map handed to zodResolver and safeParse so every field speaks the same way. */
export function friendlyError(issue: Issue): string | undefined {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.expected === 'int') return 'Enter a whole number.';
      if (issue.expected === 'number') return issue.input === undefined ? 'Enter a number.' : 'That is not a number.';
      return undefined;
    case 'too_small':
      if (issue.origin === 'array') return `Needs at least ${bound(issue.minimum)} rows.`;
      if (issue.minimum === 0) return issue.inclusive ? 'Must not be negative.' : 'Must be more than 0.';
      return `Must be at least ${bound(issue.minimum)}.`;
    case 'too_big':
      if (issue.origin === 'array') return `Takes at most ${bound(issue.maximum)} rows.`;
      return `Must be at most ${bound(issue.maximum)}.`;
    default:
      return undefined;
  }
}

/** A refusal from a shared calculation as a sentence the page can show; other errors rethrow. */
export function refusalMessage(err: unknown): string {
  if (err instanceof FitInputError || err instanceof RangeError) {
    return asSentence(err.message);
  }
  throw err;
}
