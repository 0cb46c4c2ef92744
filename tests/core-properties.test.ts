/**
 * Property tests of the core with fast-check (fixed seeds, so a failure is reproducible and its
 * shrunk counterexample becomes a fixture). Over random valid projects of one to four spans:
 * results finite; T_max ≥ H in every case and span (T = H √(1 + z′² + y′²)); vertical
 * equilibrium ΣV = total weight to 1e-9 (parabolic theory: weight per horizontal metre, exact
 * in closed form); the mirrored project gives the same numbers; a hotter case at the same cut
 * length sags more at a lower tension (α > 0); the solver is deterministic; and save → open →
 * save is the identity. References: statics, and the string equation −H v″ = q (doc/model.md).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type Load, type Project, solveProject, validateProject } from '../src/core/index.ts';
import { PROJECT_VERSION } from '../src/core/project.ts';
import { firstNonFinite } from '../src/core/resultGuard.ts';
import { hasControlCharacter } from '../src/core/validateFields.ts';
import { openProjectText, serializeProject } from '../src/deliverables/projectFile.ts';

const G = 9.80665;

interface Shape {
  spans: number[];
  rises: number[];
  mass: number;
  axialStiffness: number;
  pointLoads: { at: number; massKg: number }[];
  sagRatio: number;
  theory: 'exact' | 'parabolic';
}

const shapes: fc.Arbitrary<Shape> = fc.record({
  spans: fc.array(fc.double({ min: 2, max: 80, noNaN: true }), { minLength: 1, maxLength: 4 }),
  rises: fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: 4, maxLength: 4 }),
  mass: fc.double({ min: 0.02, max: 1, noNaN: true }),
  axialStiffness: fc.double({ min: 2e5, max: 2e7, noNaN: true }),
  pointLoads: fc.array(
    fc.record({
      at: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
      massKg: fc.double({ min: 0, max: 10, noNaN: true }),
    }),
    { maxLength: 3 },
  ),
  sagRatio: fc.double({ min: 0.01, max: 0.08, noNaN: true }),
  theory: fc.constantFrom('exact' as const, 'parabolic' as const),
});

function projectOf(s: Shape): Project {
  const xs = [0];
  for (const l of s.spans) xs.push(xs[xs.length - 1] + l);
  const total = xs[xs.length - 1];
  const loads: Load[] = s.pointLoads.map((p) => ({
    type: 'point',
    x: p.at * total,
    mass: p.massKg,
  }));
  const longest = Math.max(...s.spans);
  return {
    format: 'sagwright-project',
    version: PROJECT_VERSION,
    title: 'property test span',
    supports: xs.map((x, i) => ({
      x,
      z: 10 + (i === 0 ? 0 : s.rises[i - 1] * 0.02 * s.spans[i - 1]),
    })),
    ground: [{ x: 0, z: 0 }],
    wire: {
      label: 'property wire',
      diameter: 0.006,
      massPerLength: s.mass,
      axialStiffness: s.axialStiffness,
      thermalExpansion: 1.2e-5,
      breakingLoad: 0.01 * s.axialStiffness,
    },
    loads,
    installation: { temperature: 15, withLoads: true, target: { sag: s.sagRatio * longest } },
    cases: [
      { name: 'Cool', temperature: 0, iceThickness: 0, windSpeed: 0, withLoads: true },
      { name: 'Hot', temperature: 40, iceThickness: 0, windSpeed: 0, withLoads: true },
    ],
    limits: { safetyFactor: 2, minClearance: 0 },
    model: { theory: s.theory, elementOrder: 1, elementsPerSpan: 40 },
  };
}

/** The same project seen from the other end: x → L − x. */
function mirrored(p: Project): Project {
  const total = p.supports[p.supports.length - 1].x;
  return {
    ...structuredClone(p),
    supports: [...p.supports].reverse().map((s) => ({ ...s, x: total - s.x })),
    loads: p.loads.map((l) => (l.type === 'point' ? { ...l, x: total - l.x } : l)),
  };
}

const RUNS = { numRuns: 25, seed: 42 } as const;
/** An allowance for a loaded machine, not a speed check (npm run bench measures speed). */
const ALLOWANCE_MS = 120_000;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe('core properties over random valid projects (fast-check)', () => {
  it(
    'every generated project is valid',
    () => {
      fc.assert(
        fc.property(shapes, (s) => {
          const checked = validateProject(projectOf(s));
          expect(checked.ok ? [] : checked.issues).toEqual([]);
        }),
        RUNS,
      );
    },
    ALLOWANCE_MS,
  );

  it(
    'finite results, every case solved, and T_max ≥ H in every case and span',
    () => {
      fc.assert(
        fc.property(shapes, (s) => {
          const results = solveProject(projectOf(s));
          expect(firstNonFinite(results.cases)).toBeUndefined();
          for (const c of results.cases) {
            expect(c.solved).toBe(true);
            expect(c.maxTension).toBeGreaterThanOrEqual(c.horizontalTension);
            for (const span of c.spans)
              expect(c.maxTension).toBeGreaterThanOrEqual(span.horizontalTension);
          }
        }),
        RUNS,
      );
    },
    ALLOWANCE_MS,
  );

  it(
    'vertical equilibrium to 1e-9: the reactions carry the weight (parabolic theory)',
    () => {
      fc.assert(
        fc.property(shapes, (s) => {
          const project = projectOf({ ...s, theory: 'parabolic' });
          const total = project.supports[project.supports.length - 1].x;
          const weight =
            s.mass * G * total +
            project.loads.reduce((sum, l) => sum + (l.type === 'point' ? (l.mass ?? 0) * G : 0), 0);
          for (const c of solveProject(project).cases) {
            const carried = c.supports.reduce((sum, r) => sum + r.vertical, 0);
            expect(rel(carried, weight)).toBeLessThan(1e-9);
          }
        }),
        RUNS,
      );
    },
    ALLOWANCE_MS,
  );

  it(
    'mirror symmetry: the project seen from the other end gives the same numbers',
    () => {
      fc.assert(
        fc.property(shapes, (s) => {
          const project = projectOf(s);
          const a = solveProject(project);
          const b = solveProject(mirrored(project));
          expect(rel(b.unstressedLength, a.unstressedLength)).toBeLessThan(1e-9);
          a.cases.forEach((c, i) => {
            const m = b.cases[i];
            expect(rel(m.maxTension, c.maxTension)).toBeLessThan(1e-8);
            expect(rel(m.sag, c.sag)).toBeLessThan(1e-8);
            const first = c.supports[0];
            const last = m.supports[m.supports.length - 1];
            expect(rel(last.vertical, first.vertical)).toBeLessThan(1e-8);
          });
        }),
        RUNS,
      );
    },
    ALLOWANCE_MS,
  );

  it(
    'monotone in temperature: the hot case sags more, at lower tension, than the cool one',
    () => {
      fc.assert(
        fc.property(shapes, (s) => {
          const [, cool, hot] = solveProject(projectOf(s)).cases;
          expect(hot.horizontalTension).toBeLessThan(cool.horizontalTension);
          expect(hot.sag).toBeGreaterThan(cool.sag);
        }),
        RUNS,
      );
    },
    ALLOWANCE_MS,
  );

  it(
    'deterministic: the same document gives the same results, to the bit',
    () => {
      fc.assert(
        fc.property(shapes, (s) => {
          const project = projectOf(s);
          expect(JSON.stringify(solveProject(project))).toBe(JSON.stringify(solveProject(project)));
        }),
        { numRuns: 10, seed: 43 },
      );
    },
    ALLOWANCE_MS,
  );

  it(
    'save → open → save is the identity',
    () => {
      fc.assert(
        fc.property(shapes, fc.string({ maxLength: 40 }), (s, title) => {
          const project = {
            ...projectOf(s),
            title: [...title].filter((ch) => !hasControlCharacter(ch)).join(''),
          };
          const text = serializeProject(project);
          const opened = openProjectText(text);
          expect(opened.ok).toBe(true);
          if (opened.ok) {
            expect(opened.project).toEqual(project);
            expect(serializeProject(opened.project)).toBe(text);
          }
        }),
        { numRuns: 50, seed: 44 },
      );
    },
    ALLOWANCE_MS,
  );
});
