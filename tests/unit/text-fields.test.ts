import { describe, expect, test } from 'vitest';
import { multiLine, singleLine } from '../../shared/schemas/text.ts';

// Control characters per The Unicode Standard 15.0 §23.1 (C0 U+0000–U+001F, DEL, C1 U+0080–U+009F); well-formed
// UTF-16 per §3.9 D91 (every surrogate in a high–low pair) [S: Unicode 15.0].
const line = singleLine(40);
const text = multiLine(400);

describe('singleLine()', () => {
  test.each([
    ['NUL', 'tube\u0000scanner'],
    ['LF', 'tube\nscanner'],
    ['CR', 'tube\rscanner'],
    ['a trailing LF', 'tube scanner\n'],
    ['TAB', 'tube\tscanner'],
    ['ESC', 'tube\u001b[31m'],
    ['DEL', 'tube\u007f'],
    ['C1 NEL', 'tube\u0085scanner'],
    ['a lone high surrogate', 'tube \ud800 scanner'],
    ['a lone low surrogate', 'tube \udc00 scanner'],
    ['a reversed pair', 'tube \udc00\ud800'],
  ])('when a value holds %s, then it is refused', (_what, value) => {
    expect(line.safeParse(value).success).toBe(false);
  });

  test.each([
    ['plain text', 'Tube scanner', 'Tube scanner'],
    ['spaces around (trimmed)', '  Tube scanner  ', 'Tube scanner'],
    ['accents and symbols', 'Piezo Ø 6,35 mm · ±150 V', 'Piezo Ø 6,35 mm · ±150 V'],
    ['an emoji (a surrogate pair)', 'Scanner 🔬', 'Scanner 🔬'],
    ['U+00A0 (not a control)', 'a\u00a0b', 'a\u00a0b'],
  ])('when a value is %s, then it is kept', (_what, value, kept) => {
    expect(line.parse(value)).toBe(kept);
  });

  test('when refused, then the message names the character', () => {
    expect(line.safeParse('a\nb').error?.issues[0]?.message).toMatch(/U\+000A/);
    expect(line.safeParse('a\ud83db').error?.issues[0]?.message).toMatch(/lone surrogate, U\+D83D/);
  });
});

describe('multiLine()', () => {
  test('when text has line breaks and tabs, then it is kept; NUL, other C0, C1 and lone surrogates are refused', () => {
    expect(text.parse('First line\r\n\tsecond line')).toBe('First line\r\n\tsecond line');
    for (const bad of ['a\u0000b', 'a\u000bb', 'a\u001bb', 'a\u0090b', 'a\ud800b'])
      expect(text.safeParse(bad).success, JSON.stringify(bad)).toBe(false);
  });
});
