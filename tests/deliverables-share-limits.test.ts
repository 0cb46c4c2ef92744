/**
 * Share links are decompressed with a cap: a link that would unpack to hundreds of megabytes is
 * refused before the text is built. The bounded decompressor must read every link exactly as
 * lz-string itself does (the reference: lz-string's decompressFromEncodedURIComponent, the
 * library that writes the links), so it is checked against it on random text, random project
 * documents and random garbage (fast-check, fixed seeds).
 */
import fc from 'fast-check';
import * as lzModule from 'lz-string';
import { describe, expect, it } from 'vitest';
import { decompressBounded } from '../src/deliverables/boundedLz.ts';
import { MAX_SHARED_TEXT_CHARS, openShareFragment } from '../src/deliverables/shareLink.ts';
import { lzBomb, unpackedLength } from './helpers/lzBomb.ts';

type LzString = typeof import('lz-string');
const lz: LzString = (lzModule as unknown as { default?: LzString }).default ?? lzModule;

describe('bounded decompression reads links exactly as lz-string does', () => {
  it('round-trips any text, including astral characters and lone surrogates', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 400 }), (text) => {
        const packed = lz.compressToEncodedURIComponent(text);
        const unpacked = decompressBounded(packed, 1e6);
        expect(unpacked).toEqual({ ok: true, text });
      }),
      { seed: 12, numRuns: 300 },
    );
  });

  it('round-trips JSON documents', () => {
    fc.assert(
      fc.property(fc.json({ maxDepth: 4 }), (json) => {
        const unpacked = decompressBounded(lz.compressToEncodedURIComponent(json), 1e6);
        expect(unpacked).toEqual({ ok: true, text: json });
      }),
      { seed: 13, numRuns: 200 },
    );
  });

  it('agrees with lz-string on garbage: same text, or refused where lz-string gives nothing', () => {
    const uriChars = fc.constantFrom(
      ...'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+-$ %#é'.split(''),
    );
    fc.assert(
      fc.property(fc.array(uriChars, { maxLength: 60 }), (chars) => {
        const link = chars.join('');
        let theirs: string | null;
        try {
          theirs = lz.decompressFromEncodedURIComponent(link);
        } catch {
          theirs = null;
        }
        const ours = decompressBounded(link, 1e6);
        if (ours.ok) expect(ours.text).toBe(theirs);
        // A stream whose 2-bit header is 3 (first letter w…$) names no start: lz-string then
        // reads on from an undefined first entry and returns scraps; both sides refuse it here.
        else if (!/^[w-z0-9+\-$]/.test(link))
          expect(theirs === null || theirs === '' || theirs.length > 1e6).toBe(true);
      }),
      { seed: 14, numRuns: 2000 },
    );
  });
});

describe('a link that unpacks to far more than any project', () => {
  it('the crafted stream unpacks as designed (checked with lz-string on a small one)', () => {
    const small = lzBomb(300);
    expect(lz.decompressFromEncodedURIComponent(small)).toBe('a'.repeat(unpackedLength(300)));
    expect(decompressBounded(small, 1e6)).toEqual({
      ok: true,
      text: 'a'.repeat(unpackedLength(300)),
    });
  });

  it('is refused before its text is built: a 45 kB link that would unpack to 200 million characters', () => {
    const link = lzBomb(20_000);
    expect(link.length).toBeLessThan(50_000);
    expect(unpackedLength(20_000)).toBeGreaterThan(2e8);
    expect(decompressBounded(link, MAX_SHARED_TEXT_CHARS)).toEqual({
      ok: false,
      reason: 'too-large',
    });
    const opened = openShareFragment(`#project=${link}`);
    expect(opened.ok).toBe(false);
    if (!opened.ok)
      expect(opened.issues).toEqual([
        {
          path: '(link)',
          message:
            'unpacks to more than 1 million characters, more than any project; it was not opened',
        },
      ]);
  });

  it('just under the cap is read in full, one more code is refused', () => {
    let codes = 0;
    while (unpackedLength(codes + 1) <= 10_000) codes++;
    expect(decompressBounded(lzBomb(codes), 10_000).ok).toBe(true);
    expect(decompressBounded(lzBomb(codes + 1), 10_000)).toEqual({
      ok: false,
      reason: 'too-large',
    });
  });
});
