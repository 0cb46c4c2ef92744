/**
 * Intermediate supports: clamped (each span keeps its cut length), pulley (tension equal on both
 * sides, the wire slides) and swing link (horizontal tension equal on both sides), any mix.
 * References: symmetry (a pulley between two equal level spans carries each span as a single
 * span of half the wire), and lines of Irvine's elastic catenaries (Cable Structures, 1981,
 * §1.3) joined by the equal-tension or equal-horizontal-tension condition, solved independently
 * in tests/reference/catenaryLine.ts.
 */
import { describe, expect, it } from 'vitest';
import {
  type Attachment,
  type CaseResult,
  type CustomWire,
  type Project,
  solveProject,
  tensionWindow,
  validateProject,
} from '../src/core/index.ts';
import { singleSpan } from './helpers/projects.ts';
import {
  type Joint,
  type LineInput,
  type SpanState,
  solveSection,
} from './reference/catenaryLine.ts';

const g = 9.80665;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function solved(project: Project) {
  const check = validateProject(project);
  if (!check.ok) throw new Error(JSON.stringify(check.issues));
  return solveProject(project);
}

interface LineSpec {
  supports: { x: number; z: number; attachment?: Attachment }[];
  massPerLength: number;
  axialStiffness: number;
  thermalExpansion?: number;
  cutLength: number;
  points?: { x: number; force: number }[];
  cases?: Project['cases'];
  theory?: 'exact' | 'parabolic';
}

function line(spec: LineSpec): Project {
  const base = singleSpan({
    span: 1,
    massPerLength: spec.massPerLength,
    axialStiffness: spec.axialStiffness,
    thermalExpansion: spec.thermalExpansion,
    target: { unstressedLength: spec.cutLength },
    loads: (spec.points ?? []).map((p) => ({ type: 'point' as const, x: p.x, force: p.force })),
    cases: spec.cases,
    theory: spec.theory,
    elementsPerSpan: 800,
  });
  return { ...base, supports: spec.supports };
}

const still = (name: string, temperature: number, iceThickness = 0): Project['cases'][number] => ({
  name,
  temperature,
  iceThickness,
  windSpeed: 0,
  withLoads: true,
});

describe('a pulley between two equal level spans (symmetry: each is a single span)', () => {
  const cases = [still('Hot', 45), still('Cold, iced', -10, 0.01)];
  for (const theory of ['exact', 'parabolic'] as const) {
    it(`${theory} theory: H, sag, largest tension and end pull equal the single span's`, () => {
      const spec = { massPerLength: 0.12, axialStiffness: 1.5e6, thermalExpansion: 1.2e-5 };
      const pair = solved(
        line({
          ...spec,
          theory,
          cases,
          cutLength: 2 * 25.04,
          supports: [
            { x: 0, z: 5 },
            { x: 25, z: 5, attachment: 'pulley' },
            { x: 50, z: 5 },
          ],
        }),
      );
      const single = solved(
        singleSpan({
          ...spec,
          theory,
          cases,
          span: 25,
          target: { unstressedLength: 25.04 },
          elementsPerSpan: 800,
        }),
      );
      pair.cases.forEach((c, i) => {
        const one = single.cases[i];
        for (const span of c.spans) {
          expect(rel(span.horizontalTension, one.horizontalTension), c.name).toBeLessThan(1e-9);
          expect(rel(span.sag, one.sag), c.name).toBeLessThan(1e-9);
        }
        expect(rel(c.maxTension, one.maxTension), c.name).toBeLessThan(1e-9);
        expect(rel(c.supports[0].resultant, one.supports[0].resultant), c.name).toBeLessThan(1e-9);
        // The pulley takes twice the end's downward pull and no pull along the line.
        expect(rel(c.supports[1].vertical, 2 * one.supports[1].vertical)).toBeLessThan(1e-9);
        expect(Math.abs(c.supports[1].horizontal)).toBeLessThan(1e-9 * one.horizontalTension);
      });
    });
  }
});

/** Core results of every state against the reference's spans of the same state. */
function expectLine(c: CaseResult, ref: SpanState[], tolerance: number) {
  const worst = Math.max(
    ...ref.flatMap((span, j) => [
      rel(c.spans[j].horizontalTension, span.H),
      rel(c.spans[j].sag, span.sag),
    ]),
  );
  console.log(`${c.name}: largest relative difference in H and sag ${worst.toExponential(1)}`);
  ref.forEach((span, j) => {
    expect(rel(c.spans[j].horizontalTension, span.H), `${c.name} span ${j + 1} H`).toBeLessThan(
      tolerance,
    );
    expect(rel(c.spans[j].sag, span.sag), `${c.name} span ${j + 1} sag`).toBeLessThan(tolerance);
  });
  for (let i = 1; i < ref.length; i++) {
    const s = c.supports[i];
    expect(
      rel(s.tensionBefore ?? 0, ref[i - 1].endTension),
      `${c.name} T before ${i}`,
    ).toBeLessThan(tolerance);
    expect(rel(s.tensionAfter ?? 0, ref[i].startTension), `${c.name} T after ${i}`).toBeLessThan(
      tolerance,
    );
    const net = ref[i].H - ref[i - 1].H;
    expect(Math.abs(s.horizontal - net), `${c.name} net pull ${i}`).toBeLessThan(
      tolerance * ref[i].H,
    );
  }
}

describe('a steep lead span over a pulley against equal-tension elastic catenaries', () => {
  // Invented scenario: a wall fixing at 3 m, a corner post 5 m along at 7.5 m carrying the wire
  // on a pulley, then 25 m to a far post at 7 m; a 60 N sign hangs 12 m from the wall.
  const supports = [
    { x: 0, z: 3 },
    { x: 5, z: 7.5, attachment: 'pulley' as const },
    { x: 30, z: 7 },
  ];
  const spans = [
    { x0: 0, z0: 3, x1: 5, z1: 7.5 },
    { x0: 5, z0: 7.5, x1: 30, z1: 7, pointLoads: [{ x: 12, force: 60 }] },
  ];
  const chords = [Math.hypot(5, 4.5), Math.hypot(25, 0.5)];
  const cutLength = (chords[0] + chords[1]) * 1.002;
  const wire = { massPerLength: 0.1, axialStiffness: 1.2e6, thermalExpansion: 1.2e-5 };
  const project = line({
    ...wire,
    cutLength,
    supports,
    points: [{ x: 12, force: 60 }],
    cases: [still('Hot', 45)],
  });
  const results = solved(project);
  const joints: Joint[] = ['tension'];

  it('installation (15 °C): H, sag and tension each side of the pulley within 1e-7', () => {
    const input: LineInput = { spans, joints, weightPerLength: 0.1 * g, axialStiffness: 1.2e6 };
    const ref = solveSection(input, cutLength, [chords[0] * 1.002, chords[1] * 1.002], 300);
    const c = results.cases[0];
    expectLine(c, ref, 1e-7);
    // Not equal horizontal tension: the steep span's H is lower by its cosine at the pulley.
    expect(ref[1].H / ref[0].H).toBeGreaterThan(1.2);
    console.log(
      `pulley line: H ${ref[0].H.toFixed(2)} / ${ref[1].H.toFixed(2)} N, T at pulley ${ref[0].endTension.toFixed(2)} N, post pull along the line ${(ref[1].H - ref[0].H).toFixed(2)} N; core ${c.spans[0].horizontalTension.toFixed(2)} / ${c.spans[1].horizontalTension.toFixed(2)} N`,
    );
  });

  it('hot case (45 °C): the same wire, longer by α Δt with its weight conserved', () => {
    const factor = 1 + 1.2e-5 * 30;
    const input: LineInput = {
      spans,
      joints,
      weightPerLength: (0.1 * g) / factor,
      axialStiffness: 1.2e6,
    };
    const total = cutLength * factor;
    const ref = solveSection(input, total, [chords[0] * 1.002, chords[1] * 1.002], 300);
    expectLine(results.cases[1], ref, 1e-7);
  });
});

describe('a mixed line: pulley, swing link and clamp, as one coupled system', () => {
  // Invented scenario: four spans stepping up a slope; at installation the pulley keeps the
  // tension equal and the swing link and clamp the horizontal tension; afterwards the clamp
  // splits the line into a section of three spans and a span of its own.
  const supports = [
    { x: 0, z: 2 },
    { x: 8, z: 6, attachment: 'pulley' as const },
    { x: 26, z: 7, attachment: 'swingLink' as const },
    { x: 40, z: 12, attachment: 'clamped' as const },
    { x: 55, z: 11 },
  ];
  const spans = supports.slice(1).map((s, j) => ({
    x0: supports[j].x,
    z0: supports[j].z,
    x1: s.x,
    z1: s.z,
    pointLoads: j === 1 ? [{ x: 17, force: 40 }] : [],
  }));
  const chords = spans.map((s) => Math.hypot(s.x1 - s.x0, s.z1 - s.z0));
  const cutLength = chords.reduce((a, b) => a + b, 0) * 1.0025;
  const alpha = 1.2e-5;
  const project = line({
    massPerLength: 0.15,
    axialStiffness: 2e6,
    thermalExpansion: alpha,
    cutLength,
    supports,
    points: [{ x: 17, force: 40 }],
    cases: [still('Cold', -15)],
  });
  const results = solved(project);
  const base = { spans, weightPerLength: 0.15 * g, axialStiffness: 2e6 };
  const installed = solveSection(
    { ...base, joints: ['tension', 'horizontal', 'horizontal'] },
    cutLength,
    chords.map((c) => c * 1.0025),
    500,
  );

  it('installation: the whole line pulled through, pulley T equal, others H equal', () => {
    expectLine(results.cases[0], installed, 1e-7);
  });

  it('cold case: section 1–3 shares its length, span 4 keeps its own', () => {
    const factor = 1 + alpha * (-15 - 15);
    const weightPerLength = (0.15 * g) / factor;
    const lengths = installed.map((s) => s.unstressedLength * factor);
    const first = solveSection(
      { ...base, spans: spans.slice(0, 3), joints: ['tension', 'horizontal'], weightPerLength },
      lengths[0] + lengths[1] + lengths[2],
      lengths.slice(0, 3),
      800,
    );
    const last = solveSection(
      { ...base, spans: spans.slice(3), joints: [], weightPerLength },
      lengths[3],
      [lengths[3]],
      800,
    );
    const cold = results.cases[1];
    expectLine(cold, [...first, ...last], 1e-7);
    expect(cold.supports[1].attachment).toBe('pulley');
    expect(cold.supports[2].attachment).toBe('swingLink');
    expect(cold.supports[3].attachment).toBe('clamped');
    expect(
      rel(cold.supports[1].tensionBefore ?? 0, cold.supports[1].tensionAfter ?? 1),
    ).toBeLessThan(1e-9);
    expect(Math.abs(cold.supports[2].horizontal)).toBeLessThan(1e-9 * cold.horizontalTension);
  });
});

describe('installation targets on a line with a pulley', () => {
  const supports = [
    { x: 0, z: 3 },
    { x: 5, z: 7.5, attachment: 'pulley' as const },
    { x: 30, z: 7 },
  ];
  const base = line({ massPerLength: 0.1, axialStiffness: 1.2e6, cutLength: 31, supports });

  it('a horizontal tension target is the largest span H at installation', () => {
    const project = {
      ...base,
      installation: { ...base.installation, target: { horizontalTension: 800 } },
    };
    const c = solved(project).cases[0];
    expect(rel(Math.max(...c.spans.map((s) => s.horizontalTension)), 800)).toBeLessThan(1e-9);
    expect(rel(c.horizontalTension, 800)).toBeLessThan(1e-9);
    expect(c.spans[0].horizontalTension).toBeLessThan(c.spans[1].horizontalTension);
  });

  it('a sag target on the long span is met there', () => {
    const target = { sag: 0.5, span: 1 };
    const project = { ...base, installation: { ...base.installation, target } };
    const c = solved(project).cases[0];
    expect(Math.abs(c.spans[1].sag - 0.5)).toBeLessThan(1e-9);
  });
});

describe('the tension window of a line with a pulley speaks the target’s horizontal tension', () => {
  // Reference: the definition of the window's high end — a project installed at it has the
  // largest utilisation exactly 1 — with the installation target's horizontalTension, the
  // largest span H.
  it('installing at the high end puts the worst case exactly at the working limit', () => {
    const base = line({
      massPerLength: 0.1,
      axialStiffness: 1.2e6,
      thermalExpansion: 1.2e-5,
      cutLength: 31,
      supports: [
        { x: 0, z: 3 },
        { x: 5, z: 7.5, attachment: 'pulley' },
        { x: 30, z: 7 },
      ],
      cases: [still('Cold, iced', -10, 0.01)],
    });
    const wire = { ...(base.wire as CustomWire), breakingLoad: 8000 };
    const project: Project = { ...base, wire, model: { ...base.model, elementsPerSpan: 200 } };
    const high = tensionWindow(project).high;
    expect(high).not.toBeNull();
    const installed = solved({
      ...project,
      installation: {
        ...project.installation,
        target: { horizontalTension: high?.horizontalTension ?? 0 },
      },
    });
    const worst = Math.max(...installed.cases.map((c) => c.utilisation));
    expect(Math.abs(worst - 1)).toBeLessThan(1e-6);
  });
});
