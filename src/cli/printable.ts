/**
 * Text the command line writes to a terminal: control characters, line separators and
 * text-direction overrides from a file name or a file's keys are shown as \u escapes, so a
 * hostile file can never drive the terminal.
 */
export function printable(text: string): string {
  let out = '';
  for (const ch of text) {
    const code = ch.codePointAt(0) ?? 0;
    const control =
      code < 0x20 ||
      (code >= 0x7f && code <= 0x9f) ||
      code === 0x2028 ||
      code === 0x2029 ||
      (code >= 0x202a && code <= 0x202e) ||
      (code >= 0x2066 && code <= 0x2069);
    out += control ? `\\u${code.toString(16).padStart(4, '0')}` : ch;
  }
  return out;
}
