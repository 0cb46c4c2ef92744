/** Editing the end fittings: the first choice fills both ends, "not stated" clears both. */
import { describe, expect, it } from 'vitest';
import { validateProject } from '../src/core/index.ts';
import { setEndFitting } from '../src/state/projectEdits.ts';
import { singleSpan } from './helpers/projects.ts';

describe('setEndFitting', () => {
  const base = singleSpan({
    span: 20,
    massPerLength: 0.1,
    axialStiffness: 2e6,
    target: { horizontalTension: 1500 },
  });

  it('without fittings, choosing one end sets both to that kind (valid at once)', () => {
    const p = setEndFitting('end', { kind: 'ropeGrips' })(base);
    expect(p.limits.endFittings).toEqual({
      start: { kind: 'ropeGrips' },
      end: { kind: 'ropeGrips' },
    });
    expect(validateProject(p).ok).toBe(true);
  });

  it('changes only the chosen end once both are set, and keeps the other limits', () => {
    const one = setEndFitting('end', { kind: 'ropeGrips' })(base);
    const two = setEndFitting('start', { kind: 'custom', efficiency: 0.85 })(one);
    expect(two.limits.endFittings).toEqual({
      start: { kind: 'custom', efficiency: 0.85 },
      end: { kind: 'ropeGrips' },
    });
    expect(two.limits.safetyFactor).toBe(base.limits.safetyFactor);
  });

  it('"not stated" removes the fittings of both ends', () => {
    const one = setEndFitting('end', { kind: 'socket' })(base);
    const cleared = setEndFitting('start', undefined)(one);
    expect('endFittings' in cleared.limits).toBe(false);
    expect(validateProject(cleared).ok).toBe(true);
  });
});
