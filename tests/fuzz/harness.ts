/**
 * Seeded fuzz of the file reader, the share-link reader and the solver: valid projects, near-valid
 * ones (one field pushed to or past its range, a field removed, a wrong type) and hostile text
 * (garbage, deep nesting, huge numbers, control characters). Every outcome is classified; the
 * properties that must hold: nothing throws, a case marked solved holds only finite numbers, and
 * every refusal names a field path. Used by tests/fuzz.test.ts (short) and `npm run fuzz` (long).
 */
import * as lzModule from 'lz-string';
import { type Project, solveProject, validateProject } from '../../src/core/index.ts';
import { firstNonFinite } from '../../src/core/resultGuard.ts';
import { openProjectText } from '../../src/deliverables/projectFile.ts';
import { openShareFragment } from '../../src/deliverables/shareLink.ts';
import { type Random, random, randomProject } from '../fixtures/randomProjects.ts';

type LzString = typeof import('lz-string');
const lz: LzString = (lzModule as unknown as { default?: LzString }).default ?? lzModule;

export type Kind = 'valid' | 'near-valid' | 'hostile';

export interface FuzzTally {
  documents: number;
  byKind: Record<Kind, number>;
  refused: number;
  solved: number;
  casesSolved: number;
  casesNotSolved: number;
  throws: string[];
  nonFinite: string[];
  unnamedRefusals: string[];
  slowestMs: number;
  slowestSeed: number;
}

// biome-ignore lint/suspicious/noExplicitAny: the fuzz edits untyped JSON documents
type Doc = Record<string, any>;

const EXTREMES = [0, -0, -1, 1e-320, 5e-324, 1e-9, 1e9, 1e155, 1e308, -1e308, 0.5, 2, 1e5];
const HOSTILE_TEXT = [
  '\u001b[2J',
  '<a href="javascript:alert(1)">x</a>',
  '=HYPERLINK("x")',
  '\u202e',
  'x'.repeat(300),
  '%{x}',
  '',
];

/** Every [parent, key] pair in the document whose value is a number or text. */
function leaves(doc: unknown, out: [Doc, string][] = []): [Doc, string][] {
  if (doc && typeof doc === 'object')
    for (const [key, value] of Object.entries(doc as Doc)) {
      if (typeof value === 'number' || typeof value === 'string') out.push([doc as Doc, key]);
      else leaves(value, out);
    }
  return out;
}

function nearValid(r: Random, doc: Doc): Doc {
  const all = leaves(doc);
  for (let k = r.int(1, 2); k > 0 && all.length > 0; k--) {
    const [parent, key] = r.pick(all);
    const roll = r.uniform(0, 1);
    if (roll < 0.6 && typeof parent[key] === 'number') parent[key] = r.pick(EXTREMES);
    else if (roll < 0.7 && typeof parent[key] === 'number') parent[key] *= r.pick([-1, 1e3, 1e-3]);
    else if (roll < 0.8) delete parent[key];
    else if (roll < 0.9) parent[key] = r.pick(HOSTILE_TEXT);
    else parent[key] = r.pick([null, true, [], {}, '12']);
  }
  return doc;
}

function hostileText(r: Random, doc: Doc): string {
  switch (r.int(0, 5)) {
    case 0:
      return `${'['.repeat(r.int(10, 5000))}1${']'.repeat(r.int(0, 10))}`;
    case 1:
      return JSON.stringify(doc).slice(0, r.int(0, 400));
    case 2:
      return `\ufeff${JSON.stringify({ ...doc, extra: r.pick(HOSTILE_TEXT) })}`;
    case 3:
      return JSON.stringify({ ...doc, supports: Array.from({ length: r.int(51, 6000) }, () => 0) });
    case 4:
      return Array.from({ length: r.int(0, 200) }, () =>
        String.fromCharCode(r.int(0, 0xffff)),
      ).join('');
    default:
      return JSON.stringify({
        ...doc,
        title: r.pick(HOSTILE_TEXT),
        version: r.pick([0, 2, 1.5, 'x']),
      });
  }
}

export function emptyTally(): FuzzTally {
  return {
    documents: 0,
    byKind: { valid: 0, 'near-valid': 0, hostile: 0 },
    refused: 0,
    solved: 0,
    casesSolved: 0,
    casesNotSolved: 0,
    throws: [],
    nonFinite: [],
    unnamedRefusals: [],
    slowestMs: 0,
    slowestSeed: 0,
  };
}

/** One document from `seed`, through the file reader, the link reader and the solver. */
export function fuzzOne(seed: number, tally: FuzzTally): void {
  const r = random(seed);
  const base = randomProject(seed) as unknown as Doc;
  const kind: Kind = r.pick(['valid', 'near-valid', 'near-valid', 'hostile']);
  const text =
    kind === 'hostile'
      ? hostileText(r, base)
      : JSON.stringify(kind === 'valid' ? base : nearValid(r, structuredClone(base)));
  tally.documents++;
  tally.byKind[kind]++;
  const started = performance.now();
  try {
    const opened = openProjectText(text);
    const linked = openShareFragment(`#project=${lz.compressToEncodedURIComponent(text)}`);
    if (opened.ok !== linked.ok) tally.throws.push(`${seed}: file and link readers disagree`);
    if (!opened.ok) {
      tally.refused++;
      if (opened.issues.some((i) => !i.path || !i.message)) tally.unnamedRefusals.push(`${seed}`);
      return;
    }
    if (!validateProject(opened.project).ok) tally.throws.push(`${seed}: opened but not valid`);
    const results = solveProject(opened.project as Project);
    tally.solved++;
    for (const c of results.cases) {
      if (c.solved) tally.casesSolved++;
      else tally.casesNotSolved++;
      const bad = c.solved ? firstNonFinite(c) : undefined;
      if (bad) tally.nonFinite.push(`${seed}: ${c.name}.${bad}`);
    }
  } catch (error) {
    tally.throws.push(`${seed}: ${error instanceof Error ? error.message : String(error)}`);
  } finally {
    const ms = performance.now() - started;
    if (ms > tally.slowestMs) {
      tally.slowestMs = ms;
      tally.slowestSeed = seed;
    }
  }
}
