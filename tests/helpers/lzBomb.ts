/**
 * A share-link body in lz-string's URI-safe format that unpacks to a run of one letter whose
 * length grows quadratically with the link: each code names the previous string plus one more
 * letter (the LZ "KwKwK" case). `codes` codes unpack to 1 + (2 + 3 + … + (codes + 1)) letters,
 * so 20 000 codes (a 50 kB link) unpack to about 200 million characters.
 */
const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+-$';

export function unpackedLength(codes: number): number {
  return 1 + ((codes + 1) * (codes + 2)) / 2 - 1;
}

export function lzBomb(codes: number, letter = 'a'): string {
  const chars: string[] = [];
  let value = 0;
  let filled = 0;
  const write = (bits: number, count: number) => {
    for (let i = 0; i < count; i++) {
      value = (value << 1) | ((bits >> i) & 1);
      if (++filled === 6) {
        chars.push(ALPHABET[value]);
        value = 0;
        filled = 0;
      }
    }
  };
  write(0, 2); // an 8-bit literal follows
  write(letter.charCodeAt(0), 8);
  let dictSize = 4;
  let numBits = 3;
  let enlargeIn = 4;
  for (let k = 0; k < codes; k++) {
    write(dictSize, numBits); // the entry about to be made: previous + its first letter
    dictSize++;
    if (--enlargeIn === 0) {
      enlargeIn = 2 ** numBits;
      numBits++;
    }
  }
  write(2, numBits); // end of stream
  if (filled > 0) write(0, 6 - filled);
  return chars.join('');
}
