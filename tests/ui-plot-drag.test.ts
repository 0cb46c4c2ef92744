/**
 * What the side view lets a person drag (dragEdits.ts) and the narrow figure (compactFigure.ts),
 * in plain Node: a handle per fixing and per point load, a point load's handle on the installed
 * wire, refusals worded as the inputs word their fields, in the chosen units; on a phone no
 * legend, no fixing names on the plot and notes pointing inwards.
 */
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { compactFigure, compactTitles } from '../src/ui/plot/compactFigure.ts';
import {
  dragHandles,
  fieldWords,
  moveEdit,
  refusalText,
  wireHeightAt,
} from '../src/ui/plot/dragEdits.ts';
import { buildSagFigure } from '../src/ui/plot/sagFigure.ts';

function checked(input: unknown): Project {
  const result = validateProject(input);
  if (!result.ok) throw new Error('example project invalid');
  return structuredClone(result.project);
}

const project = checked(demo);
const results = solveProject(project);

describe('drag handles', () => {
  it('gives every fixing and every point load a handle, the load on the installed wire', () => {
    const handles = dragHandles(project, results);
    expect(handles.map((h) => [h.key, h.name])).toEqual([
      ['supports[0]', 'Kitchen wall bracket'],
      ['supports[1]', 'Studio wall bracket'],
      ['loads[1]', 'Centre lantern'],
    ]);
    const lantern = handles[2];
    const installation = results.cases[0];
    expect(installation.id).toBe('installation');
    // The lantern hangs at mid-span, the installed wire's lowest point (symmetric demo).
    expect(lantern.z).toBeCloseTo(installation.lowestPoint.z, 2);
  });

  it('interpolates the wire height linearly between profile points', () => {
    const profile = results.cases[0].profile;
    if (!profile) throw new Error('no profile');
    const mid = (profile.x[10] + profile.x[11]) / 2;
    expect(wireHeightAt(results, mid)).toBeCloseTo((profile.z[10] + profile.z[11]) / 2, 12);
  });

  it('moves a fixing in both directions and a point load along the span only', () => {
    const [, far, lantern] = dragHandles(project, results);
    const moved = moveEdit(far, 21.7, 4.5)(project);
    expect(moved.supports[1]).toMatchObject({ x: 21.7, z: 4.5, label: 'Studio wall bracket' });
    const slid = moveEdit(lantern, 12.3, 99)(project);
    expect(slid.loads[1]).toMatchObject({ type: 'point', x: 12.3 });
    expect(slid.supports).toEqual(project.supports);
  });
});

describe('refusals in the inputs’ words', () => {
  const far = dragHandles(project, results)[1];

  it('names the field another item breaks, with the rule in the chosen units', () => {
    const attempt = moveEdit(far, 20, 4.2)(project);
    const issues = validateProject(attempt);
    if (issues.ok) throw new Error('expected a refusal');
    const si = refusalText(project, far, { x: 20, z: 4.2 }, issues.issues, 'si');
    expect(si.text).toBe(
      'Studio wall bracket cannot go to 20.00 m along, 4.20 m high: Festoon cable with lamps To must be at most 20 m. It stays where it was.',
    );
    expect(si.details).toEqual(['loads[0].to: must be at most 20']);
    // 20 m = 65.6168 ft (NIST SP 811: 1 ft = 0.3048 m exactly).
    const imperial = refusalText(project, far, { x: 20, z: 4.2 }, issues.issues, 'imperial');
    expect(imperial.text).toContain('at most 65.6168 ft');
  });

  it('names the dragged field itself when its own rule is broken', () => {
    const attempt = moveEdit(far, -1, 4.2)(project);
    const issues = validateProject(attempt);
    if (issues.ok) throw new Error('expected a refusal');
    const text = refusalText(project, far, { x: -1, z: 4.2 }, issues.issues, 'si').text;
    expect(text).toMatch(/^Studio wall bracket Position: must be further along the span/);
  });

  it('words zone, ground and target paths as the inputs label them', () => {
    expect(fieldWords(project, 'limits.zones[0].to')).toBe('Walkway To');
    expect(fieldWords(project, 'ground[1].x')).toBe('Ground point 2 Position');
    expect(fieldWords(project, 'installation.target.sag')).toBe('Sag target');
    expect(fieldWords(project, 'wire.catalogId')).toBe('wire.catalogId');
  });
});

describe('the plot on a phone', () => {
  const wide = buildSagFigure(project, results, 'si');
  const narrow = compactFigure(wide, compactTitles('side', 'm'));

  it('draws no legend and no fixing names, with short axis titles', () => {
    expect(wide.layout.showlegend).not.toBe(false);
    expect(narrow.layout.showlegend).toBe(false);
    const supports = narrow.data.find((t) => t.name === 'Supports') as { mode?: string };
    expect(supports.mode).toBe('markers');
    expect((narrow.layout.yaxis as { title: { text: string } }).title.text).toBe('Height (m)');
  });

  it('drops the case name from the notes and points a note right of the middle inwards', () => {
    const texts = (narrow.layout.annotations ?? []).map((a) => a.text);
    expect(texts.some((t) => t?.startsWith('Lowest point'))).toBe(true);
    for (const text of texts) expect(text).not.toMatch(/\(/);
    const moved = checked(demo);
    (moved.loads[1] as { x: number }).x = 18;
    const right = compactFigure(
      buildSagFigure(moved, solveProject(moved), 'si'),
      compactTitles('side', 'm'),
    );
    const lowest = (right.layout.annotations ?? []).find((a) => a.text?.startsWith('Lowest'));
    expect(lowest?.x).toBeGreaterThan(11);
    expect(lowest?.xanchor).toBe('right');
    expect(lowest?.ax).toBeLessThan(0);
  });
});
