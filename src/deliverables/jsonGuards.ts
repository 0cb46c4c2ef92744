/**
 * Guards that run on the raw text of a project file before JSON.parse: size, nesting depth and
 * list lengths. A hostile or corrupted file is refused cheaply, with the path of the offending
 * list, before any object is built from it.
 */
import type { ValidationIssue } from '../core/index.ts';

export const MAX_FILE_BYTES = 1_000_000;
export const MAX_NESTING_DEPTH = 12;
export const MAX_LIST_ENTRIES = 5_000;

interface Frame {
  kind: 'object' | 'array';
  /** Entries seen so far (commas + 1 once a value has started). */
  entries: number;
  key: string;
  expectingKey: boolean;
}

/** Path of the innermost open container, e.g. supports[3].label. */
function containerPath(stack: Frame[]): string {
  const parents = stack.slice(0, -1);
  const parentPath = parents.map((frame) =>
    frame.kind === 'array' ? `[${Math.max(0, frame.entries - 1)}]` : `.${frame.key}`,
  );
  return parentPath.join('').replace(/^\./, '') || '(document)';
}

/** Byte length of text as UTF-8, without allocating an encoded copy. */
export function utf8Length(text: string): number {
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code < 0x80) bytes += 1;
    else if (code < 0x800) bytes += 2;
    else if (code >= 0xd800 && code <= 0xdbff) {
      bytes += 4;
      i++;
    } else bytes += 3;
  }
  return bytes;
}

/** Reads a JSON string starting at the opening quote; returns its raw content and end index. */
function skipString(text: string, start: number): { end: number; raw: string } {
  let i = start + 1;
  while (i < text.length && text[i] !== '"') i += text[i] === '\\' ? 2 : 1;
  return { end: i, raw: text.slice(start + 1, Math.min(i, start + 81)) };
}

/**
 * Scans the text once, tracking containers, and returns the first guard it breaks (or none).
 * Malformed JSON is left for JSON.parse to describe.
 */
export function checkJsonShape(text: string): ValidationIssue | undefined {
  const size = utf8Length(text);
  if (size > MAX_FILE_BYTES)
    return {
      path: '(file)',
      message: `is ${(size / 1e6).toFixed(1)} MB; a project file must be at most ${MAX_FILE_BYTES / 1e6} MB`,
    };
  const stack: Frame[] = [];
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    const top = stack[stack.length - 1];
    if (ch === '"') {
      const { end, raw } = skipString(text, i);
      if (top?.kind === 'object' && top.expectingKey) {
        top.key = raw;
        top.expectingKey = false;
      }
      i = end;
    } else if (ch === '{' || ch === '[') {
      if (top?.kind === 'array' && top.entries === 0) top.entries = 1;
      stack.push({
        kind: ch === '{' ? 'object' : 'array',
        entries: 0,
        key: '',
        expectingKey: true,
      });
      if (stack.length > MAX_NESTING_DEPTH)
        return {
          path: containerPath(stack),
          message: `is nested more than ${MAX_NESTING_DEPTH} levels deep; a project file is never that deep`,
        };
    } else if (ch === '}' || ch === ']') {
      stack.pop();
    } else if (ch === ',' && top) {
      top.entries += 1;
      top.expectingKey = top.kind === 'object';
      if (top.kind === 'array' && top.entries > MAX_LIST_ENTRIES)
        return {
          path: containerPath(stack),
          message: `has more than ${MAX_LIST_ENTRIES} entries; refused before reading it`,
        };
    } else if (top?.kind === 'array' && top.entries === 0 && !/\s/.test(ch)) {
      top.entries = 1;
    }
  }
  return undefined;
}
