import { z } from './zod';

// PostgreSQL text cannot hold NUL, and no name, note or address needs a control character.
export const NO_CONTROL_CHARACTERS = 'must not contain control characters';
const LINE_CONTROL = /[\u0000-\u001f\u007f-\u009f]/;
// Notes and texts keep their tabs and line breaks.
const TEXT_CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;

export function hasControlCharacters(value: string, multiLine = false): boolean {
  return (multiLine ? TEXT_CONTROL : LINE_CONTROL).test(value);
}

/** A one-line text field: a name, an e-mail, a maker. */
export const lineText = () => z.string().refine((s) => !hasControlCharacters(s), NO_CONTROL_CHARACTERS);

/** A text that may run over several lines: notes, the warranty. */
export const multiLineText = () => z.string().refine((s) => !hasControlCharacters(s, true), NO_CONTROL_CHARACTERS);
