/**
 * Field checkers for project validation: each records an issue with the field path and the rule
 * it breaks, and never repairs a value.
 */

import { describeRange, type FieldRange, formatBound } from './fieldRanges.ts';

/** C0 and C1 controls, line and paragraph separators, and text-direction overrides. */
export function hasControlCharacter(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code < 0x20 || (code >= 0x7f && code <= 0x9f)) return true;
    if (code === 0x2028 || code === 0x2029) return true;
    if ((code >= 0x202a && code <= 0x202e) || (code >= 0x2066 && code <= 0x2069)) return true;
  }
  return false;
}

/**
 * Text from the file quoted for a message: at most 60 characters, in JSON quotes, with every
 * control character and text-direction override as a \u escape (a message never carries raw
 * escape sequences to a terminal or a screen).
 */
export function quoted(text: string): string {
  let out = '';
  for (const ch of text.slice(0, 60)) {
    if (ch === '"' || ch === '\\') out += `\\${ch}`;
    else if (hasControlCharacter(ch)) out += `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`;
    else out += ch;
  }
  return `"${out}"${text.length > 60 ? '…' : ''}`;
}

/** A key as it appears in a field path: bare when it is a plain name, else quoted. */
function keyInPath(key: string): string {
  return /^[A-Za-z_$][\w$]{0,59}$/.test(key) ? key : `[${quoted(key)}]`;
}

export interface ValidationIssue {
  path: string;
  message: string;
}

export type Json = Record<string, unknown>;

export class FieldChecker {
  readonly issues: ValidationIssue[] = [];

  fail(path: string, message: string): void {
    this.issues.push({ path, message });
  }

  /** An object with only `allowed` keys; path '' is the document itself. */
  object(value: unknown, path: string, allowed: readonly string[]): Json | undefined {
    if (typeof value !== 'object' || value === null || Array.isArray(value)) {
      this.fail(path || '(document)', 'must be an object');
      return undefined;
    }
    for (const key of Object.keys(value)) {
      if (allowed.includes(key)) continue;
      const shown = keyInPath(key);
      this.fail(
        path ? `${path}${shown.startsWith('[') ? '' : '.'}${shown}` : shown,
        'is not a known field',
      );
    }
    return value as Json;
  }

  array(value: unknown, path: string, min: number, max: number): unknown[] | undefined {
    if (!Array.isArray(value)) {
      this.fail(path, 'must be a list');
      return undefined;
    }
    if (value.length < min) this.fail(path, `must have at least ${min} entries`);
    if (value.length > max) {
      this.fail(path, `must have at most ${max} entries`);
      return undefined;
    }
    return value;
  }

  /** A finite number in [min, max] (exclusive bounds when the flags say so). */
  number(
    value: unknown,
    path: string,
    min = -Infinity,
    max = Infinity,
    { minExclusive = false, maxExclusive = false } = {},
  ): number | undefined {
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      this.fail(path, value === undefined ? 'is required (a number)' : 'must be a finite number');
      return undefined;
    }
    const low = minExclusive ? value <= min : value < min;
    const high = maxExclusive ? value >= max : value > max;
    if (low) this.fail(path, `must be ${minExclusive ? 'greater than' : 'at least'} ${min}`);
    else if (high) this.fail(path, `must be ${maxExclusive ? 'less than' : 'at most'} ${max}`);
    else return value;
    return undefined;
  }

  /** A finite number inside a physical range; the message states the whole range. */
  inRange(value: unknown, path: string, r: FieldRange): number | undefined {
    const allowed = `the range is ${describeRange(r)}`;
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      this.fail(
        path,
        value === undefined
          ? `is required (a number; ${allowed})`
          : `must be a finite number; ${allowed}`,
      );
      return undefined;
    }
    if (r.minExclusive ? value <= r.min : value < r.min)
      this.fail(
        path,
        `must be ${r.minExclusive ? 'greater than' : 'at least'} ${formatBound(r.min)}; ${allowed}`,
      );
    else if (value > r.max) this.fail(path, `must be at most ${formatBound(r.max)}; ${allowed}`);
    else return value;
    return undefined;
  }

  /** Text of at most maxLength characters with no control characters. */
  label(value: unknown, path: string, maxLength: number, required = true): string | undefined {
    const text = this.string(value, path, maxLength, required);
    if (text !== undefined && hasControlCharacter(text)) {
      this.fail(
        path,
        'must not contain control characters, line breaks or text-direction overrides',
      );
      return undefined;
    }
    return text;
  }

  positive(value: unknown, path: string, max = Infinity): number | undefined {
    return this.number(value, path, 0, max, { minExclusive: true });
  }

  integer(value: unknown, path: string, min: number, max: number): number | undefined {
    const n = this.number(value, path, min, max);
    if (n !== undefined && !Number.isInteger(n)) {
      this.fail(path, 'must be a whole number');
      return undefined;
    }
    return n;
  }

  string(value: unknown, path: string, maxLength: number, required = true): string | undefined {
    if (value === undefined && !required) return undefined;
    if (typeof value !== 'string') {
      this.fail(path, 'must be text');
      return undefined;
    }
    if (value.length > maxLength) this.fail(path, `must be at most ${maxLength} characters`);
    return value;
  }

  boolean(value: unknown, path: string, required = true): boolean | undefined {
    if (value === undefined && !required) return undefined;
    if (typeof value !== 'boolean') {
      this.fail(path, 'must be true or false');
      return undefined;
    }
    return value;
  }

  oneOf<T extends string | number>(
    value: unknown,
    path: string,
    options: readonly T[],
  ): T | undefined {
    if (!options.includes(value as T)) {
      this.fail(path, `must be one of ${options.map((o) => JSON.stringify(o)).join(', ')}`);
      return undefined;
    }
    return value as T;
  }
}
