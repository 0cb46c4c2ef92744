/**
 * `npm run fuzz [-- DOCUMENTS [FIRST_SEED]]`: the long seeded fuzz of the file reader, the
 * share-link reader and the solver (tests/fuzz/harness.ts). Prints the tally; exits 1 when any
 * document threw, showed a non-finite number in a solved case, or was refused without a path.
 */
import { emptyTally, fuzzOne } from '../tests/fuzz/harness.ts';

const documents = Number(process.argv[2] ?? 5000);
const first = Number(process.argv[3] ?? 1);
const tally = emptyTally();
const started = performance.now();
for (let seed = first; seed < first + documents; seed++) {
  fuzzOne(seed, tally);
  if ((seed - first + 1) % 500 === 0)
    process.stdout.write(
      `${seed - first + 1} documents, ${((performance.now() - started) / 1000).toFixed(0)} s\n`,
    );
}
const { throws, nonFinite, unnamedRefusals, ...counts } = tally;
process.stdout.write(
  `${JSON.stringify({ ...counts, throws: throws.length, nonFinite: nonFinite.length, unnamedRefusals: unnamedRefusals.length, seconds: (performance.now() - started) / 1000 }, null, 2)}\n`,
);
for (const line of [...throws, ...nonFinite, ...unnamedRefusals].slice(0, 20))
  process.stdout.write(`${line}\n`);
process.exitCode = throws.length + nonFinite.length + unnamedRefusals.length > 0 ? 1 : 0;
