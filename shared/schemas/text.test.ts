import { describe, expect, it } from 'vitest';
import { nameText, text } from './text';

describe('text and nameText', () => {
  const notes = text({ max: 100 });
  const name = nameText({ max: 100 });

  it('refuse NUL and lone surrogates, and keep a surrogate pair (an emoji)', () => {
    expect(notes.safeParse('a\u0000b').success).toBe(false);
    expect(notes.safeParse('a\ud800b').success).toBe(false);
    expect(notes.safeParse('a\udc00b').success).toBe(false);
    expect(notes.safeParse('torque 🔧 ok').data).toBe('torque 🔧 ok');
  });

  it('keep tabs and line breaks in free text, not in names', () => {
    expect(notes.safeParse('line one\n\tline two').success).toBe(true);
    expect(name.safeParse('Acme\nBcc: x@y.example').error?.issues[0]?.message).toMatch(/one line/);
    expect(name.safeParse('Acme\tStamping').success).toBe(false);
  });

  it('refuse other control characters and direction overrides in both', () => {
    for (const schema of [notes, name]) {
      expect(schema.safeParse('bell\u0007').error?.issues[0]?.message).toMatch(/U\+0007/);
      expect(schema.safeParse('next\u0085line').success).toBe(false);
      expect(schema.safeParse('abc\u202Edef').error?.issues[0]?.message).toMatch(/U\+202E/);
      expect(schema.safeParse('abc\u2066def\u2069').success).toBe(false);
    }
  });

  it('keep right-to-left script itself, which needs no direction control', () => {
    expect(name.safeParse('שלום').success).toBe(true);
  });
});
