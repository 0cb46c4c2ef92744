/**
 * Document edits and the edit check the input fields use: an edit is applied to a copy, the
 * copy goes through the core's validator, and only a valid copy reaches the store. Rules
 * quoted in refusals are the core validator's (src/core/validateProject.ts); unit bounds are
 * converted with the NIST SP 811 exact factors (1 mph = 0.44704 m/s, 1 ft = 0.3048 m).
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { validateProject } from '../src/core/index.ts';
import { demoProject } from '../src/state/demoProject.ts';
import { carryDependants } from '../src/state/dependants.ts';
import { fieldName, issueLine } from '../src/state/fieldNames.ts';
import * as edits from '../src/state/projectEdits.ts';
import { undo, useProjectStore } from '../src/state/projectStore.ts';
import { localiseRule, tryEdit } from '../src/ui/fields/useDocumentEdit.ts';

function fresh() {
  return { tryEdit, useProjectStore, undo, localiseRule };
}

beforeEach(() => useProjectStore.getState().resetProject(demoProject));

describe('document edits keep the project valid and immutable', () => {
  it('duplicating a case gives it a free name and leaves the original untouched', () => {
    const before = structuredClone(demoProject);
    const after = edits.duplicateCase(0)(demoProject);
    expect(after.cases.map((c) => c.name)).toEqual([
      'Hot summer',
      'Hot summer (2)',
      'Cold, iced, windy',
      'Winter storm',
    ]);
    expect(validateProject(after).ok).toBe(true);
    expect(demoProject).toEqual(before);
  });

  it('renaming or deleting the case a target is stated in keeps the target consistent', () => {
    const stated = edits.setTarget({ maxTension: 1000, case: 'Cold, iced, windy' })(demoProject);
    const renamed = edits.patchCase(1, { name: 'Ice storm' })(stated);
    expect(renamed.installation.target.case).toBe('Ice storm');
    expect(validateProject(renamed).ok).toBe(true);
    const removed = carryDependants(renamed, edits.removeCase(1)(renamed)).project;
    expect('case' in removed.installation.target).toBe(false);
    expect(validateProject(removed).ok).toBe(true);
  });

  it('added items are valid at once', () => {
    let project = demoProject;
    for (const edit of [
      edits.addCase(),
      edits.addCase(),
      edits.addLoad('point'),
      edits.addLoad('uniform'),
      edits.addZone(),
      edits.addSupport(),
    ])
      project = edit(project);
    const checked = validateProject(project);
    expect(checked.ok ? [] : checked.issues).toEqual([]);
    expect(project.cases.map((c) => c.name).slice(-2)).toEqual(['New case', 'New case (2)']);
  });
});

describe('tryEdit', () => {
  it('commits a valid edit as one undoable step', () => {
    const { tryEdit, useProjectStore, undo } = fresh();
    expect(tryEdit('supports[1].x', edits.patchSupport(1, { x: 24 }), 'length', 'si')).toBeNull();
    expect(useProjectStore.getState().project.supports[1].x).toBe(24);
    undo();
    expect(useProjectStore.getState().project.supports[1].x).toBe(22);
  });

  it('refuses an out-of-range value with the rule in the display unit and leaves the document', () => {
    const { tryEdit, useProjectStore } = fresh();
    const before = useProjectStore.getState().project;
    const reason = tryEdit(
      'cases[0].windSpeed',
      edits.patchCase(0, { windSpeed: -1 }),
      'speed',
      'imperial',
    );
    // 70 m/s / 0.44704 = 156.5855 mph
    expect(reason).toBe('must be at least 0 mph; the range is 0 to 156.586 mph');
    expect(useProjectStore.getState().project).toBe(before);
  });

  it('names the other field an edit would break', () => {
    const { tryEdit, useProjectStore } = fresh();
    const before = useProjectStore.getState().project;
    // Shortening the span to 10 m leaves the 11 m lantern and the 21.5 m cable end outside it.
    const reason = tryEdit('supports[1].x', edits.patchSupport(1, { x: 10 }), 'length', 'si');
    expect(reason).toBe('must be beyond the end of Festoon cable with lamps at 21.5 m');
    expect(useProjectStore.getState().project).toBe(before);
  });

  it('names the other field as the workbench shows it, in feet and inches for imperial', () => {
    const { tryEdit } = fresh();
    const reason = tryEdit('supports[1].x', edits.patchSupport(1, { x: 10 }), 'length', 'imperial');
    // 21.5 m / 0.0254 = 846.457 in = 70 ft 6 1/2 in to the nearest eighth (846.5 in).
    expect(reason).toBe(
      'must be beyond the end of Festoon cable with lamps at 70\u00a0ft\u00a06\u00a01/2\u00a0in',
    );
    expect(reason).not.toMatch(/loads\[/);
  });

  it('words a refusal elsewhere without the internal path, the path kept in the details line', () => {
    const project = useProjectStore.getState().project;
    expect(fieldName(project, 'loads[0].to')).toBe('the end of Festoon cable with lamps');
    expect(fieldName(project, 'supports[1].x')).toBe('Studio wall bracket position');
    expect(fieldName(project, 'cases[0].windSpeed')).toBe('Hot summer wind speed');
    expect(fieldName(project, 'limits.minClearance')).toBe('Minimum clearance above ground');
    expect(issueLine(project, { path: 'loads[0].to', message: 'must be at most 10' }, 'si')).toBe(
      'The end of Festoon cable with lamps: must be at most 10 m (loads[0].to)',
    );
  });

  it('states the support-order rule at the field being typed', () => {
    const { tryEdit } = fresh();
    const reason = tryEdit('supports[1].x', edits.patchSupport(1, { x: -2 }), 'length', 'si');
    expect(reason).toContain('must be further along the span than the previous support');
  });
});

describe('localiseRule', () => {
  it('converts SI bounds to the display unit and leaves other text alone', () => {
    const { localiseRule } = fresh();
    expect(localiseRule('must be at most 0.2', 'diameter', 'si')).toBe('must be at most 200 mm');
    // 100 m / 0.3048 = 328.084 ft
    expect(localiseRule('must be at most 100', 'length', 'imperial')).toBe(
      'must be at most 328.084 ft',
    );
    expect(localiseRule('must be a whole number', 'count', 'si')).toBe('must be a whole number');
    expect(
      localiseRule('must be at most 0.1; the range is 0.0005 to 0.1 m', 'diameter', 'si'),
    ).toBe('must be at most 100 mm; the range is 0.5 to 100 mm');
  });
});
