/**
 * lz-string's URI-safe decompression (the format share links are written in by
 * lz-string's compressToEncodedURIComponent), with a cap on the output. An LZ stream can expand
 * quadratically (each code may name a string one longer than the last), so a 400 000-character
 * link could otherwise produce gigabytes before anything can look at it. Here decompression
 * stops as soon as the text would pass maxChars, before that text is built.
 * Same algorithm and bit layout as lz-string 1.5 (MIT), rewritten with the limit.
 */

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+-$';
const VALUE = new Map([...ALPHABET].map((ch, i) => [ch, i]));

export type BoundedResult =
  | { ok: true; text: string }
  | { ok: false; reason: 'damaged' | 'too-large' };

class BitReader {
  private value: number;
  private position = 32;
  private index = 1;

  constructor(private readonly input: string) {
    this.value = this.at(0);
  }

  private at(i: number): number {
    return VALUE.get(this.input.charAt(i)) ?? 0;
  }

  get exhausted(): boolean {
    return this.index > this.input.length;
  }

  read(bitCount: number): number {
    let bits = 0;
    for (let power = 1, k = 0; k < bitCount; k++, power *= 2) {
      const bit = this.value & this.position;
      this.position >>= 1;
      if (this.position === 0) {
        this.position = 32;
        this.value = this.at(this.index++);
      }
      if (bit > 0) bits += power;
    }
    return bits;
  }
}

/** Decompresses a share-link body; refuses output longer than maxChars without building it. */
export function decompressBounded(encoded: string, maxChars: number): BoundedResult {
  const input = encoded.replace(/ /g, '+');
  if (input === '') return { ok: false, reason: 'damaged' };
  const reader = new BitReader(input);
  const dictionary: string[] = ['', '', ''];
  const first = reader.read(2);
  if (first === 2) return { ok: true, text: '' };
  if (first > 2) return { ok: false, reason: 'damaged' };
  let w = String.fromCharCode(reader.read(first === 0 ? 8 : 16));
  dictionary.push(w);
  const parts = [w];
  let total = w.length;
  let numBits = 3;
  let enlargeIn = 4;
  const grow = () => {
    if (--enlargeIn === 0) {
      enlargeIn = 2 ** numBits;
      numBits++;
    }
  };
  for (;;) {
    if (reader.exhausted) return { ok: false, reason: 'damaged' };
    let code = reader.read(numBits);
    if (code === 2) return { ok: true, text: parts.join('') };
    if (code < 2) {
      dictionary.push(String.fromCharCode(reader.read(code === 0 ? 8 : 16)));
      code = dictionary.length - 1;
      grow();
    }
    let entry: string;
    if (code < dictionary.length && dictionary[code] !== '') entry = dictionary[code];
    else if (code === dictionary.length) entry = w + w.charAt(0);
    else return { ok: false, reason: 'damaged' };
    total += entry.length;
    if (total > maxChars) return { ok: false, reason: 'too-large' };
    parts.push(entry);
    dictionary.push(w + entry.charAt(0));
    grow();
    w = entry;
  }
}
