/**
 * A short seeded fuzz inside `npm test` (tests/fuzz/harness.ts; `npm run fuzz` runs a long one):
 * valid, near-valid and hostile documents through the file reader, the share-link reader and the
 * solver. Nothing throws, no case marked solved holds a non-finite number, every refusal names a
 * field, and the file and link readers agree. Bounded by a document count, not by the clock.
 */
import { describe, expect, it } from 'vitest';
import { emptyTally, fuzzOne } from './fuzz/harness.ts';

const FIRST_SEED = 20_000;
const DOCUMENTS = 120;

describe(`seeded fuzz of the readers and the solver (${DOCUMENTS} documents)`, () => {
  it('never throws, never shows a non-finite number in a solved case, names every refusal', () => {
    const tally = emptyTally();
    for (let seed = FIRST_SEED; seed < FIRST_SEED + DOCUMENTS; seed++) fuzzOne(seed, tally);
    expect(tally.throws).toEqual([]);
    expect(tally.nonFinite).toEqual([]);
    expect(tally.unnamedRefusals).toEqual([]);
    // The mix really exercises both paths.
    expect(tally.refused).toBeGreaterThan(10);
    expect(tally.solved).toBeGreaterThan(10);
    for (const count of Object.values(tally.byKind)) expect(count).toBeGreaterThan(5);
  }, 300_000);
});
